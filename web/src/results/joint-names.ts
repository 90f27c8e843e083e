/** What a joint joins, in the parts' own names: "Top flange to both webs", "Ply 3 to ply 2". */
export interface NamedPart {
  id: string;
  name?: string;
}

const partName = (parts: NamedPart[], id: string) => {
  const name = parts.find((p) => p.id === id)?.name?.trim();
  return name ? name : id;
};

/** Lower-case a name's first letter inside a sentence, unless it reads as an abbreviation ("PLY", "W18x50"). */
const inSentence = (name: string) => (/^[A-Z][a-z]/.test(name) ? name[0]!.toLowerCase() + name.slice(1) : name);

function listed(names: string[]): string {
  // Two parts of one sort ("Left web", "Right web"): "both webs".
  if (names.length === 2) {
    const last = names.map((n) => n.trim().split(/\s+/));
    const noun = last[0]!.at(-1)!;
    if (last[0]!.length > 1 && last[1]!.length > 1 && noun.toLowerCase() === last[1]!.at(-1)!.toLowerCase() && /^[a-z]+$/i.test(noun)) return `both ${noun.toLowerCase()}s`;
  }
  if (names.length <= 1) return names.join("");
  return `${names.slice(0, -1).join(", ")} and ${names.at(-1)}`;
}

export function jointName(joint: { held: string[]; lines: { between: [string, string] | string[] }[] }, parts: NamedPart[]): string {
  const held = joint.held.map((id) => partName(parts, id));
  const others = [...new Set(joint.lines.flatMap((l) => l.between).filter((id) => !joint.held.includes(id)))].map((id) => inSentence(partName(parts, id)));
  const heldText = listed(held);
  const first = heldText.charAt(0).toUpperCase() + heldText.slice(1);
  return others.length ? `${first} to ${listed(others)}` : first;
}

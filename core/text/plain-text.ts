/**
 * Characters that must not be in a name a person types: C0 and C1 controls and DEL, and the marks and
 * overrides that change the direction text is shown in (U+200E/F, U+061C, U+202A–U+202E, U+2066–U+2069).
 * A direction override in a member mark reorders what the worksheet prints after it, so a sheet's text
 * could read otherwise than it is.
 */
export const HIDDEN_CHARACTERS = /[\u0000-\u001f\u007f-\u009f\u061c\u200e\u200f\u202a-\u202e\u2066-\u2069]/u;
const HIDDEN_ALL = new RegExp(HIDDEN_CHARACTERS.source, "gu");

const codePoint = (c: string) => `U+${c.codePointAt(0)!.toString(16).toUpperCase().padStart(4, "0")}`;

/** The first such character and where it is, for an error message: "U+202E at character 4"; undefined when there is none. */
export function hiddenCharacter(text: string): string | undefined {
  const match = HIDDEN_CHARACTERS.exec(text);
  return match ? `${codePoint(match[0])} at character ${[...text.slice(0, match.index)].length + 1}` : undefined;
}

/** Text with every such character shown as ⟨U+202E⟩: for names stored before they were refused. */
export function showHidden(text: string): string {
  return text.replace(HIDDEN_ALL, (c) => `⟨${codePoint(c)}⟩`);
}

/** Hands a blob to the browser as a download with the given file name. */
export function saveBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement("a");
  link.href = url;
  link.download = fileName;
  link.hidden = true;
  document.body.append(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

/** A file name from the member's mark and revision: letters, digits, '-' and '_' only. */
export function jobFileName(job: Record<string, unknown>): string {
  const member = (job.member ?? {}) as Record<string, unknown>;
  const stem = [member.mark, member.revision ? `rev${String(member.revision)}` : ""]
    .filter((s) => typeof s === "string" && s !== "")
    .join("-")
    .replace(/[^A-Za-z0-9_-]+/g, "_");
  return `${stem || "job"}.stitchplan.json`;
}

import { closeSync, constants, fstatSync, lstatSync, openSync, writeSync } from "node:fs";

/** A file's identity (device and inode): the same file under another path, a link or another letter case. */
export const identityOf = (info: { dev: number; ino: number }) => `${info.dev}:${info.ino}`;

/**
 * Writes one output file. Never through a symbolic link (one planted in the output folder would make
 * the batch write wherever it points), never over an input file (`inputs`: their identities), and never
 * into anything but a regular file. Throws an Error whose message says why, in a person's words.
 */
export function writeOutputFile(path: string, content: string | Uint8Array, inputs: ReadonlySet<string>): void {
  let existing;
  try {
    existing = lstatSync(path);
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code !== "ENOENT") throw error;
  }
  if (existing?.isSymbolicLink()) throw new Error(`${path} is a symbolic link; stitchplan does not write through links (remove it, or choose another --out folder)`);
  if (existing && !existing.isFile()) throw new Error(`${path} exists and is not a regular file`);
  if (existing && inputs.has(identityOf(existing))) throw new Error(`writing ${path} would overwrite an input file; choose another --out folder`);
  // O_NOFOLLOW: a link put in its place since the check above is refused by the system, not followed.
  const fd = openSync(path, constants.O_WRONLY | constants.O_CREAT | constants.O_TRUNC | constants.O_NOFOLLOW, 0o666);
  try {
    if (inputs.has(identityOf(fstatSync(fd)))) throw new Error(`writing ${path} would overwrite an input file; choose another --out folder`);
    const bytes = typeof content === "string" ? Buffer.from(content) : content;
    let done = 0;
    while (done < bytes.length) done += writeSync(fd, bytes, done, bytes.length - done);
  } finally {
    closeSync(fd);
  }
}

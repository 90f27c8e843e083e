import { closeSync, constants, fstatSync, lstatSync, openSync, writeSync, type Stats } from "node:fs";
import { lstat, open } from "node:fs/promises";

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
  refuseExisting(path, existing, inputs);
  const fd = openSync(path, WRITE_FLAGS, 0o666);
  try {
    if (inputs.has(identityOf(fstatSync(fd)))) throw new Error(`writing ${path} would overwrite an input file; choose another --out folder`);
    const bytes = typeof content === "string" ? Buffer.from(content) : content;
    let done = 0;
    while (done < bytes.length) done += writeSync(fd, bytes, done, bytes.length - done);
  } finally {
    closeSync(fd);
  }
}

// O_NOFOLLOW: a link put in its place since the check before opening is refused by the system, not followed.
const WRITE_FLAGS = constants.O_WRONLY | constants.O_CREAT | constants.O_TRUNC | constants.O_NOFOLLOW;

function refuseExisting(path: string, existing: Stats | undefined, inputs: ReadonlySet<string>): void {
  if (existing?.isSymbolicLink()) throw new Error(`${path} is a symbolic link; stitchplan does not write through links (remove it, or choose another --out folder)`);
  if (existing && !existing.isFile()) throw new Error(`${path} exists and is not a regular file`);
  if (existing && inputs.has(identityOf(existing))) throw new Error(`writing ${path} would overwrite an input file; choose another --out folder`);
}

/**
 * writeOutputFile with the same checks, on the system's threads: a batch on one thread designs the
 * next member while this member's files are written (each file costs about as much as a design on a
 * busy disk).
 */
export async function writeOutputFileAsync(path: string, content: string | Uint8Array, inputs: ReadonlySet<string>): Promise<void> {
  let existing;
  try {
    existing = await lstat(path);
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code !== "ENOENT") throw error;
  }
  refuseExisting(path, existing, inputs);
  const handle = await open(path, WRITE_FLAGS, 0o666);
  try {
    if (inputs.has(identityOf(await handle.stat()))) throw new Error(`writing ${path} would overwrite an input file; choose another --out folder`);
    const bytes = typeof content === "string" ? Buffer.from(content) : content;
    let done = 0;
    while (done < bytes.length) done += (await handle.write(bytes, done, bytes.length - done)).bytesWritten;
  } finally {
    await handle.close();
  }
}

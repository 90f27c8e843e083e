import { close, closeSync, constants, fstatSync, lstatSync, open as openFile, openSync, write, writeSync, type Stats } from "node:fs";
import { lstat, open } from "node:fs/promises";

/** A file's identity (device and inode): the same file under another path, a link or another letter case. */
export const identityOf = (info: { dev: number; ino: number }) => `${info.dev}:${info.ino}`;

/**
 * Writes one output file. Never through a symbolic link (one planted in the output folder would make
 * the batch write wherever it points), never over an input file (`inputs`: their identities), and never
 * into anything but a regular file. Throws an Error whose message says why, in a person's words.
 */
export function writeOutputFile(path: string, content: string | Uint8Array, inputs: ReadonlySet<string>): void {
  let created;
  try {
    created = openSync(path, CREATE_FLAGS, 0o666);
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code !== "EEXIST") throw error;
  }
  if (created !== undefined) {
    try {
      writeAllSync(created, content);
    } finally {
      closeSync(created);
    }
    return;
  }
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
    writeAllSync(fd, content);
  } finally {
    closeSync(fd);
  }
}

function writeAllSync(fd: number, content: string | Uint8Array): void {
  const bytes = typeof content === "string" ? Buffer.from(content) : content;
  let done = 0;
  while (done < bytes.length) done += writeSync(fd, bytes, done, bytes.length - done);
}

// O_NOFOLLOW: a link put in its place since the check before opening is refused by the system, not followed.
const WRITE_FLAGS = constants.O_WRONLY | constants.O_CREAT | constants.O_TRUNC | constants.O_NOFOLLOW;
/**
 * A new file, the usual case in a fresh output folder: O_EXCL fails on any existing name (a symbolic
 * link too, dangling or not), so a file it creates is a regular file that is no input and was no link,
 * and the checks of an existing one (lstat before, fstat after) are not needed: three system calls
 * instead of five per file. On EEXIST the file is written with those checks.
 */
const CREATE_FLAGS = constants.O_WRONLY | constants.O_CREAT | constants.O_EXCL | constants.O_NOFOLLOW;

/** A new file's bytes through the callback API (one promise per file instead of one per call and a FileHandle). */
function createOutputFile(path: string, content: string | Uint8Array): Promise<boolean> {
  const bytes = typeof content === "string" ? Buffer.from(content) : content;
  return new Promise((resolve, reject) => {
    openFile(path, CREATE_FLAGS, 0o666, (error, fd) => {
      if (error) return error.code === "EEXIST" ? resolve(false) : reject(error);
      const finish = (failure: Error | null) => close(fd, (closing) => (failure ?? closing ? reject(failure ?? closing) : resolve(true)));
      const from = (done: number): void =>
        done >= bytes.length
          ? finish(null)
          : write(fd, bytes, done, bytes.length - done, null, (failure, written) => (failure ? finish(failure) : from(done + written)));
      from(0);
    });
  });
}

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
  if (await createOutputFile(path, content)) return;
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

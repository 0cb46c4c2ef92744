/**
 * Reading a project file for the command line, defensively: the size is checked (fstat) before
 * anything is read, and the read itself stops one byte past the limit, so a pipe, a device or a
 * file that grows cannot make the tool swallow more. A UTF-8 byte-order mark is accepted (as the
 * browser accepts it). Errors are reported by kind, never with the file's contents.
 */
import { closeSync, fstatSync, openSync, readSync } from 'node:fs';
import { MAX_FILE_BYTES } from '../deliverables/jsonGuards.ts';

export type ReadOutcome = { ok: true; text: string } | { ok: false; message: string };

const REASONS: Record<string, string> = {
  ENOENT: 'no such file',
  EACCES: 'permission denied',
  EPERM: 'permission denied',
  EISDIR: 'it is a folder, not a file',
  ELOOP: 'too many symbolic links',
  ENAMETOOLONG: 'the name is too long',
};

function reason(error: unknown): string {
  const code = (error as { code?: string }).code ?? '';
  return REASONS[code] ?? (code ? `error ${code}` : 'unknown error');
}

const tooLarge = (bytes: string) =>
  `is ${bytes}; a project file must be at most ${MAX_FILE_BYTES / 1e6} MB`;

/** Reads at most limit + 1 bytes from an open descriptor. */
function readCapped(fd: number, limit: number): Buffer | undefined {
  const chunks: Buffer[] = [];
  let total = 0;
  const chunk = Buffer.allocUnsafe(64 * 1024);
  for (;;) {
    const count = readSync(fd, chunk, 0, chunk.length, null);
    if (count === 0) return Buffer.concat(chunks, total);
    total += count;
    if (total > limit) return undefined;
    chunks.push(Buffer.from(chunk.subarray(0, count)));
  }
}

export function readProjectFile(path: string, limit = MAX_FILE_BYTES): ReadOutcome {
  let fd: number;
  try {
    fd = openSync(path, 'r');
  } catch (error) {
    return { ok: false, message: `cannot read (${reason(error)})` };
  }
  try {
    const stat = fstatSync(fd);
    if (stat.isDirectory())
      return { ok: false, message: 'cannot read (it is a folder, not a file)' };
    if (stat.isFile() && stat.size > limit)
      return { ok: false, message: tooLarge(`${(stat.size / 1e6).toFixed(1)} MB`) };
    const bytes = readCapped(fd, limit);
    if (!bytes) return { ok: false, message: tooLarge(`more than ${limit / 1e6} MB`) };
    const text = new TextDecoder('utf-8', { fatal: true, ignoreBOM: false }).decode(bytes);
    return { ok: true, text };
  } catch (error) {
    if (error instanceof TypeError) return { ok: false, message: 'is not UTF-8 text' };
    return { ok: false, message: `cannot read (${reason(error)})` };
  } finally {
    closeSync(fd);
  }
}

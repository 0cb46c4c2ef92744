/**
 * Share links: the whole project document, compressed with lz-string, in the URL fragment
 * (#project=...). The fragment never reaches a server. Opening a link goes through the same
 * guards, migration and validator as opening a file.
 */
import * as lzModule from 'lz-string';
import type { Project } from '../core/index.ts';
import { decompressBounded } from './boundedLz.ts';
import { MAX_FILE_BYTES } from './jsonGuards.ts';
import { type OpenResult, openProjectText } from './projectFile.ts';

type LzString = typeof import('lz-string');
// lz-string is CommonJS; bundlers expose it either as the namespace or as its default export.
const lz: LzString = (lzModule as unknown as { default?: LzString }).default ?? lzModule;

export const SHARE_KEY = 'project';
/** Longer fragments than this are refused before decompressing (browsers cap URLs near 2 MB). */
export const MAX_FRAGMENT_CHARS = 400_000;
/** Decompression stops before the text passes this many characters (a project file's limit). */
export const MAX_SHARED_TEXT_CHARS = MAX_FILE_BYTES;

/** The fragment, with its leading '#'. */
export function shareFragment(project: Project): string {
  return `#${SHARE_KEY}=${lz.compressToEncodedURIComponent(JSON.stringify(project))}`;
}

/** The page address with the project in its fragment (any existing fragment replaced). */
export function shareUrl(project: Project, pageUrl: string): string {
  const hashAt = pageUrl.indexOf('#');
  return `${hashAt < 0 ? pageUrl : pageUrl.slice(0, hashAt)}${shareFragment(project)}`;
}

/** True when the fragment carries a shared project (whether or not it is a valid one). */
export function hasSharedProject(hash: string): boolean {
  return hash.replace(/^#/, '').startsWith(`${SHARE_KEY}=`);
}

/** Reads a shared project from a fragment such as location.hash. */
export function openShareFragment(hash: string): OpenResult {
  const body = hash.replace(/^#/, '');
  if (!body.startsWith(`${SHARE_KEY}=`))
    return { ok: false, issues: [{ path: '(link)', message: 'carries no project' }] };
  const packed = body.slice(SHARE_KEY.length + 1);
  if (packed.length > MAX_FRAGMENT_CHARS)
    return {
      ok: false,
      issues: [{ path: '(link)', message: `is longer than ${MAX_FRAGMENT_CHARS} characters` }],
    };
  const unpacked = decompressBounded(packed, MAX_SHARED_TEXT_CHARS);
  if (!unpacked.ok && unpacked.reason === 'too-large')
    return {
      ok: false,
      issues: [
        {
          path: '(link)',
          message: `unpacks to more than ${MAX_SHARED_TEXT_CHARS / 1e6} million characters, more than any project; it was not opened`,
        },
      ],
    };
  if (!unpacked.ok || unpacked.text === '')
    return {
      ok: false,
      issues: [{ path: '(link)', message: 'is damaged or cut short; ask for the link again' }],
    };
  return openProjectText(unpacked.text);
}

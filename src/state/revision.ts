/**
 * A number for each version of the document, so that an edit, the solver's reply for it and the
 * plot drawn from that reply can be matched in performance measurements (`npm run bench`).
 * Numbers follow the order in which versions are first seen; the document is never changed.
 */
const revisions = new WeakMap<object, number>();
let nextRevision = 1;

/** Performance marks and measures, each with `detail: { revision }`. */
export const EDIT_MARK = 'sagwright:edit';
export const RESULT_MARK = 'sagwright:result';

export function documentRevision(project: object): number {
  let revision = revisions.get(project);
  if (revision === undefined) {
    revision = nextRevision++;
    revisions.set(project, revision);
  }
  return revision;
}

/** Records a performance mark for this version of the document. */
export function markRevision(name: string, project: object): void {
  performance.mark(name, { detail: { revision: documentRevision(project) } });
}

/** Plain words for how a fixing holds the wire, shared by the editor, the tables and the report. */
import type { Attachment, Project } from '../core/index.ts';

/** Short name for tables. */
export const ATTACHMENT_NAME: Readonly<Record<Attachment | 'end', string>> = {
  end: 'end fixing',
  clamped: 'clamped',
  pulley: 'pulley',
  swingLink: 'swing link',
};

/** What each choice means, for the editor's list. */
export const ATTACHMENT_CHOICE: Readonly<Record<Attachment, string>> = {
  clamped: 'Clamped (each span keeps its wire)',
  pulley: 'Pulley or smooth eye (wire slides, same tension)',
  swingLink: 'Swing link (same horizontal pull)',
};

/** The attachment of support i of a project: the two ends are end fixings. */
export function attachmentOf(project: Project, i: number): Attachment | 'end' {
  if (i === 0 || i === project.supports.length - 1) return 'end';
  return project.supports[i]?.attachment ?? 'clamped';
}

export function attachmentWords(project: Project, i: number): string {
  return ATTACHMENT_NAME[attachmentOf(project, i)];
}

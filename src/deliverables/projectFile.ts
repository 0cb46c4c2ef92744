/**
 * Project files (.sagwright.json): save a project as text, and open text or a file through the
 * guards, the version migration and the core's validator. Opening never changes anything by
 * itself: it returns the project or the list of issues (field path and rule) for the caller.
 */
import {
  migrationNotes,
  PROJECT_FORMAT,
  PROJECT_VERSION,
  type Project,
  type ValidationIssue,
  validateProject,
} from '../core/index.ts';
import { checkJsonShape, MAX_FILE_BYTES } from './jsonGuards.ts';
import { MIGRATIONS, type Migration, migrateDocument } from './migrations.ts';

export const PROJECT_FILE_EXTENSION = '.sagwright.json';

export type OpenResult =
  | { ok: true; project: Project; migratedFrom?: number; notes?: string[] }
  | { ok: false; issues: ValidationIssue[] };

/** The file text: the document exactly as stored, SI units, two-space indented. */
export function serializeProject(project: Project): string {
  return `${JSON.stringify(project, null, 2)}\n`;
}

/** A file name from the title: letters, digits and dashes only, then the extension. */
export function projectFileName(title: string): string {
  const stem = title
    .normalize('NFKD')
    .replace(/[^\w\s-]/g, '')
    .trim()
    .replace(/[\s_]+/g, '-')
    .replace(/-+/g, '-')
    .toLowerCase()
    .slice(0, 60);
  return `${stem || 'project'}${PROJECT_FILE_EXTENSION}`;
}

function refuse(path: string, message: string): OpenResult {
  return { ok: false, issues: [{ path, message }] };
}

function parseJson(text: string): { ok: true; value: unknown } | { ok: false; message: string } {
  try {
    return { ok: true, value: JSON.parse(text) };
  } catch (error) {
    // The parser's own message quotes the text (a file's first line could be anything): only
    // the place is reported.
    const at = /position (\d+)/.exec(error instanceof Error ? error.message : '');
    if (!at) return { ok: false, message: 'is not valid JSON' };
    const before = text.slice(0, Number(at[1]));
    const line = before.split('\n').length;
    const column = before.length - before.lastIndexOf('\n');
    return { ok: false, message: `is not valid JSON (line ${line}, column ${column})` };
  }
}

/** Checks the header before the body, so a wrong file gets one clear sentence, not fifty. */
function checkHeader(value: unknown): OpenResult | undefined {
  if (typeof value !== 'object' || value === null || Array.isArray(value))
    return refuse('(document)', 'must be a JSON object (a Sagwright project)');
  const doc = value as Record<string, unknown>;
  if (doc.format !== PROJECT_FORMAT)
    return refuse('format', `must be "${PROJECT_FORMAT}": this is not a Sagwright project file`);
  const version = doc.version;
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 1)
    return refuse('version', 'must be a whole number, 1 or more');
  if (version > PROJECT_VERSION)
    return refuse(
      'version',
      `${version} is newer than this Sagwright reads (${PROJECT_VERSION}); open it in a newer Sagwright`,
    );
  return undefined;
}

/** Opens project text: guards, parse, header, migration, validation. */
export function openProjectText(
  text: string,
  migrations: Readonly<Record<number, Migration>> = MIGRATIONS,
): OpenResult {
  const shape = checkJsonShape(text);
  if (shape) return { ok: false, issues: [shape] };
  const parsed = parseJson(text);
  if (!parsed.ok) return refuse('(file)', parsed.message);
  const header = checkHeader(parsed.value);
  if (header) return header;
  const migrated = migrateDocument(parsed.value as Record<string, unknown>, migrations);
  if (!migrated.ok) return { ok: false, issues: migrated.issues };
  const checked = validateProject(migrated.document);
  if (!checked.ok) return checked;
  if (migrated.from === undefined) return { ok: true, project: checked.project };
  const notes = migrationNotes(parsed.value as Record<string, unknown>);
  return { ok: true, project: checked.project, migratedFrom: migrated.from, notes };
}

/** Opens a file the person picked; an oversized file is refused before it is read. */
export async function openProjectFile(file: Blob & { name?: string }): Promise<OpenResult> {
  if (file.size > MAX_FILE_BYTES)
    return refuse(
      '(file)',
      `is ${(file.size / 1e6).toFixed(1)} MB; a project file must be at most ${MAX_FILE_BYTES / 1e6} MB`,
    );
  return openProjectText(await file.text());
}

/** Issues as lines a person can read: "supports[1].x: must be greater than ...". */
export function describeIssues(issues: readonly ValidationIssue[], max = 8): string[] {
  const lines = issues
    .slice(0, max)
    .map((issue) => (issue.path ? `${issue.path}: ${issue.message}` : issue.message));
  if (issues.length > max) lines.push(`… and ${issues.length - max} more`);
  return lines;
}

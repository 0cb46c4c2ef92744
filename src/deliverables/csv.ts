/**
 * CSV of the wire profile of every case: one row per sampled point, columns case, x, height,
 * clearance above the ground line, wire tension (units in the headers) and the case's identity
 * ("installation" or "cases[i]"), which tells two cases apart even when their names repeat. The cautions
 * head the file as '#' comment lines so the data never travels without them.
 */
import { CAUTIONS, type Project, type ProjectResults } from '../core/index.ts';
import { toDisplay, type UnitSystem, unitSymbol } from './displayUnits.ts';
import { groundHeightAt } from './groundLine.ts';

/**
 * Quotes a text cell (always: every cell of the person's text is quoted); a leading = + - @ tab or carriage return (or their full-width forms) is
 * defused with an apostrophe so a spreadsheet never runs the cell as a formula.
 */
export function csvText(value: string): string {
  const defused = /^[=+\-@\t\r\uff1d\uff0b\uff0d\uff20]/.test(value) ? `'${value}` : value;
  return `"${defused.replace(/"/g, '""')}"`;
}

function csvNumber(value: number, digits: number): string {
  return Number.isFinite(value) ? value.toFixed(digits) : '';
}

export function csvHeader(system: UnitSystem): string[] {
  const length = unitSymbol(system, 'length');
  const force = unitSymbol(system, 'force');
  return [
    'case',
    `x (${length})`,
    `height z (${length})`,
    `clearance above ground (${length})`,
    `tension (${force})`,
    'case id',
  ];
}

function commentLines(project: Project, generatedAt: Date): string[] {
  return [
    // The title is the person's text: a quoted, defused cell of its own beside the comment.
    `# Sagwright wire profiles,${csvText(project.title.replace(/[\r\n]+/g, ' '))}`,
    `# Generated ${generatedAt.toISOString()}; heights above the ground datum, clearance above the ground line.`,
    ...CAUTIONS.map((caution) => `# Caution - ${caution.title}: ${caution.text}`),
  ];
}

export function profilesCsv(
  project: Project,
  results: ProjectResults,
  system: UnitSystem,
  generatedAt = new Date(),
): string {
  const lengthDigits = system === 'si' ? 4 : 3;
  const lines = [...commentLines(project, generatedAt), csvHeader(system).join(',')];
  for (const result of results.cases) {
    const profile = result.profile;
    if (!result.solved || !profile) continue;
    const name = csvText(result.name);
    for (let i = 0; i < profile.x.length; i++) {
      const x = profile.x[i];
      const z = profile.z[i];
      const clearance = z - groundHeightAt(project.ground, x);
      lines.push(
        [
          name,
          csvNumber(toDisplay(system, 'length', x), lengthDigits),
          csvNumber(toDisplay(system, 'length', z), lengthDigits),
          csvNumber(toDisplay(system, 'length', clearance), lengthDigits),
          csvNumber(toDisplay(system, 'force', profile.tension[i]), 1),
          result.id,
        ].join(','),
      );
    }
  }
  return `${lines.join('\r\n')}\r\n`;
}

/**
 * The project-format document lists every field that takes one of a list (doc/project-format.md,
 * "Choices"). These checks tie that table to the lists the validator actually uses, so the
 * document cannot drift from the code, and show that a value off the list is refused with the
 * list in the message.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { END_FITTING_KINDS } from '../src/core/endFittings.ts';
import { ATTACHMENTS } from '../src/core/project.ts';
import { validateProject } from '../src/core/validateProject.ts';
import { singleSpan } from './helpers/projects.ts';

const doc = readFileSync(new URL('../doc/project-format.md', import.meta.url), 'utf8');
const choicesRow = (field: string): string => {
  const row = doc.split('\n').find((line) => line.startsWith(`| ${field} |`));
  if (row === undefined) throw new Error(`no row for ${field} in the Choices table`);
  return row.split('|')[2];
};

describe('the Choices table names exactly the lists the validator uses', () => {
  it('supports[].attachment', () => {
    const listed = [...choicesRow('supports[].attachment').matchAll(/"(\w+)"/g)].map((m) => m[1]);
    expect(new Set(listed)).toEqual(new Set(ATTACHMENTS));
  });
  it('limits.endFittings.start/end.kind', () => {
    const listed = [...choicesRow('limits.endFittings.start/end.kind').matchAll(/"(\w+)"/g)].map(
      (m) => m[1],
    );
    expect(listed).toEqual([...END_FITTING_KINDS]);
  });
});

describe('a value off its list is refused with the field and the list', () => {
  it('an intermediate support that says "hook"', () => {
    const project = singleSpan({
      span: 20,
      massPerLength: 0.1,
      axialStiffness: 2e6,
      target: { horizontalTension: 500 },
    });
    const supports = [
      project.supports[0],
      { x: 10, z: 0, attachment: 'hook' },
      project.supports[1],
    ];
    const result = validateProject({ ...project, supports });
    expect(result.ok).toBe(false);
    const messages = result.ok ? [] : result.issues.map((i) => `${i.path}: ${i.message}`);
    expect(
      messages.some((m) => m.startsWith('supports[1].attachment') && m.includes('"pulley"')),
    ).toBe(true);
  });
});

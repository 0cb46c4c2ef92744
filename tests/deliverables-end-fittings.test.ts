/**
 * The report's design-basis line for the end fittings: the fitting at each end with its
 * efficiency and source, and the working limit = breaking load × weaker efficiency / safety
 * factor (EN 13414-1 definition of the working load limit); or that none were stated.
 */
import { describe, expect, it } from 'vitest';
import { installationLines } from '../src/deliverables/reportContent.ts';
import { singleSpan } from './helpers/projects.ts';

describe('report: end fittings in the design basis', () => {
  const base = singleSpan({
    span: 20,
    massPerLength: 0.1,
    axialStiffness: 2e6,
    target: { horizontalTension: 1500 },
  });

  it('names both fittings, their sources and the working limit they set', () => {
    const project = {
      ...base,
      limits: {
        ...base.limits,
        endFittings: {
          start: { kind: 'ferruleEye' as const },
          end: { kind: 'ropeGrips' as const },
        },
      },
    };
    const line = installationLines(project, 'si').find((l) => l.startsWith('End fittings'));
    expect(line).toMatch(/first fixing Ferrule-secured eye \(90 %; EN 13411-3/);
    expect(line).toMatch(/last fixing Wire rope grips \(80 %; EN 13411-5/);
    expect(line).toMatch(/Working limit = breaking load x 80 % \/ 5\./);
  });

  it('says when no fittings were stated', () => {
    const line = installationLines(base, 'si').find((l) => l.startsWith('End fittings'));
    expect(line).toMatch(
      /not stated; the working limit assumes terminations as strong as the wire/,
    );
  });
});

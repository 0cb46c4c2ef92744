/**
 * The design-aid options of the command line: `--window`, `--choose` and `--at TEMP` add
 * `window`, `choices` and `setting` to the results JSON with the contract's keys and the core's
 * values; the results themselves are unchanged; a bad temperature exits 2 naming the option.
 */
import { spawnSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { chooseWires, settingAt, solveProject, tensionWindow } from '../src/core/index.ts';
import { loadExample } from './helpers/designProjects.ts';

const FILE = 'examples/courtyard-lights.json';
const TIMEOUT_MS = 120_000;

function solveCli(...args: string[]) {
  const run = spawnSync('npx', ['tsx', 'src/cli/main.ts', ...args], {
    encoding: 'utf8',
    timeout: TIMEOUT_MS,
  });
  return { status: run.status, stdout: run.stdout, stderr: run.stderr };
}

const roundTrip = <T>(value: T): T => JSON.parse(JSON.stringify(value));

describe('npm run solve -- FILE --window --choose --at TEMP', () => {
  it(
    'adds window, choices and setting with the contract keys; the results stay as they are',
    () => {
      const run = solveCli(FILE, '--window', '--choose', '--at', '8');
      expect(run.stderr).toBe('');
      expect(run.status).toBe(0);
      const printed = JSON.parse(run.stdout);
      const project = loadExample(FILE);
      const { window, choices, setting, ...results } = printed;
      expect(results).toEqual(roundTrip(solveProject(project)));
      expect(Object.keys(window).sort()).toEqual(['advice', 'empty', 'high', 'low']);
      expect(Object.keys(window.low).sort()).toEqual(['case', 'check', 'horizontalTension']);
      expect(window).toEqual(roundTrip(tensionWindow(project)));
      for (const c of choices)
        expect(Object.keys(c).sort()).toEqual(
          [
            'catalogId',
            'high',
            'label',
            'low',
            'massPerLength',
            'suggestedHorizontalTension',
          ].sort(),
        );
      expect(choices.map((c: { catalogId: string }) => c.catalogId)).toEqual(
        chooseWires(project).map((c) => c.catalogId),
      );
      for (const key of [
        'temperature',
        'horizontalTension',
        'maxTension',
        'sag',
        'sagAt',
        'midSpanSag',
        'lowestPoint',
        'returnTime',
        'frequency',
        'notes',
      ])
        expect(setting).toHaveProperty(key);
      expect(setting).toEqual(roundTrip(settingAt(project, 8)));
    },
    TIMEOUT_MS,
  );

  it(
    '--at=-5 works; --at without a number or out of range exits 2 naming --at',
    () => {
      const ok = solveCli(FILE, '--at=-5');
      expect(ok.status).toBe(0);
      expect(JSON.parse(ok.stdout).setting.temperature).toBe(-5);
      for (const args of [['--at'], ['--at', 'warm'], ['--at', '95']]) {
        const bad = solveCli(FILE, ...args);
        expect(bad.status).toBe(2);
        expect(bad.stderr).toMatch(/^--at: /);
      }
    },
    TIMEOUT_MS,
  );
});

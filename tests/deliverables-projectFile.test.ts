/**
 * Project files and share links: round trips against the shipped example files, and hostile or
 * malformed files each refused with the field path and the rule. Reference for every refusal:
 * the project contract in doc/project-format.md ("anything missing, unknown, of the wrong type, non-finite
 * or out of physical range is refused with a message naming the field path and the rule").
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { Project } from '../src/core/index.ts';
import { MAX_FILE_BYTES, MAX_LIST_ENTRIES } from '../src/deliverables/jsonGuards.ts';
import { migrateDocument } from '../src/deliverables/migrations.ts';
import {
  describeIssues,
  openProjectFile,
  openProjectText,
  projectFileName,
  serializeProject,
} from '../src/deliverables/projectFile.ts';
import { openShareFragment, shareUrl } from '../src/deliverables/shareLink.ts';

const EXAMPLES = [
  'courtyard-lights.json',
  'workshop-yard-inclined.json',
  'terrace-corner-pulley.json',
];
const exampleText = (name: string) =>
  readFileSync(new URL(`../examples/${name}`, import.meta.url), 'utf8');
const courtyard = (): Record<string, unknown> => JSON.parse(exampleText('courtyard-lights.json'));

function refusal(text: string) {
  const result = openProjectText(text);
  if (result.ok) throw new Error('expected the file to be refused');
  return result.issues;
}

describe('round trips', () => {
  for (const name of EXAMPLES) {
    it(`save then open gives the identical document: ${name}`, () => {
      const original = JSON.parse(exampleText(name));
      const opened = openProjectText(serializeProject(original));
      expect(opened).toEqual({ ok: true, project: original });
    });

    it(`share link then open gives the identical document: ${name}`, () => {
      const original = JSON.parse(exampleText(name)) as Project;
      const url = shareUrl(original, 'https://example.test/app/?x=1#old');
      expect(url.startsWith('https://example.test/app/?x=1#project=')).toBe(true);
      expect(openShareFragment(new URL(url).hash)).toEqual({ ok: true, project: original });
    });
  }

  it('keeps a title with markup and non-Latin text verbatim (it is text, never markup)', () => {
    const doc = { ...courtyard(), title: '<img src=x onerror=alert(1)> Hof & Garten — 庭' };
    const viaFile = openProjectText(serializeProject(doc as unknown as Project));
    const viaLink = openShareFragment(
      new URL(shareUrl(doc as unknown as Project, 'http://h/')).hash,
    );
    expect(viaFile.ok && viaFile.project.title).toBe(doc.title);
    expect(viaLink.ok && viaLink.project.title).toBe(doc.title);
  });

  it('reads a file the person picked (Blob) the same way', async () => {
    const blob = new Blob([exampleText('courtyard-lights.json')]);
    expect(await openProjectFile(blob)).toEqual({ ok: true, project: courtyard() });
  });

  it('names the file after the title with the .sagwright.json extension', () => {
    expect(projectFileName('Courtyard festoon lights')).toBe(
      'courtyard-festoon-lights.sagwright.json',
    );
    expect(projectFileName('<b>/../..')).toBe('b.sagwright.json');
    expect(projectFileName('')).toBe('project.sagwright.json');
  });
});

describe('refusals: each names the field path and the rule', () => {
  const cases: {
    what: string;
    edit: (doc: Record<string, unknown>) => string;
    path: string;
    rule: RegExp;
  }[] = [
    {
      what: 'wrong type (a number written as text)',
      edit: (d) =>
        JSON.stringify({
          ...d,
          supports: [
            { x: '0', z: 4.2 },
            { x: 22, z: 4.2 },
          ],
        }),
      path: 'supports[0].x',
      rule: /finite number/,
    },
    {
      what: '"NaN" as a string',
      edit: (d) =>
        JSON.stringify({
          ...d,
          installation: { temperature: 'NaN', withLoads: true, target: { sag: 0.45 } },
        }),
      path: 'installation.temperature',
      rule: /finite number/,
    },
    {
      what: '"Infinity" as a string',
      edit: (d) =>
        JSON.stringify({ ...d, limits: { safetyFactor: 'Infinity', minClearance: 2.4 } }),
      path: 'limits.safetyFactor',
      rule: /finite number/,
    },
    {
      what: 'a bare NaN literal (not JSON at all)',
      edit: (d) => JSON.stringify(d).replace('"safetyFactor":5', '"safetyFactor":NaN'),
      path: '(file)',
      rule: /not valid JSON/,
    },
    {
      what: 'a huge list, refused before parsing',
      edit: (d) =>
        JSON.stringify({
          ...d,
          ground: Array.from({ length: MAX_LIST_ENTRIES + 1 }, (_, i) => ({ x: i, z: 0 })),
        }),
      path: 'ground',
      rule: new RegExp(`more than ${MAX_LIST_ENTRIES} entries`),
    },
    {
      what: 'a list longer than the contract allows',
      edit: (d) =>
        JSON.stringify({ ...d, ground: Array.from({ length: 1001 }, (_, i) => ({ x: i, z: 0 })) }),
      path: 'ground',
      rule: /at most 1000 entries/,
    },
    {
      what: 'deep nesting',
      edit: (d) =>
        JSON.stringify(d).replace(
          '"title":"Courtyard festoon lights"',
          `"title":${'['.repeat(200)}${']'.repeat(200)}`,
        ),
      // The document is level 1, so the 13th container is the 11th list inside the title.
      path: `title${'[0]'.repeat(11)}`,
      rule: /nested more than 12 levels/,
    },
    {
      what: 'an oversized file',
      edit: (d) => JSON.stringify({ ...d, title: 'x'.repeat(MAX_FILE_BYTES) }),
      path: '(file)',
      rule: /at most 1 MB/,
    },
    {
      what: 'a newer version',
      edit: (d) => JSON.stringify({ ...d, version: 3 }),
      path: 'version',
      rule: /3 is newer than this Sagwright reads \(2\)/,
    },
    {
      what: 'a wrong format',
      edit: (d) => JSON.stringify({ ...d, format: 'spreadsheet' }),
      path: 'format',
      rule: /not a Sagwright project file/,
    },
    {
      what: 'a list instead of a document',
      edit: (d) => JSON.stringify([d]),
      path: '(document)',
      rule: /must be a JSON object/,
    },
    {
      what: 'a __proto__ key',
      edit: (d) => JSON.stringify(d).replace('{', '{"__proto__":{"polluted":true},'),
      path: '__proto__',
      rule: /not a known field/,
    },
    {
      what: 'a cut-short (corrupted) file',
      edit: (d) => JSON.stringify(d).slice(0, 300),
      path: '(file)',
      rule: /not valid JSON/,
    },
    {
      what: 'an out-of-range value',
      edit: (d) => JSON.stringify({ ...d, limits: { safetyFactor: 0.5, minClearance: 2.4 } }),
      path: 'limits.safetyFactor',
      rule: /at least 1/,
    },
    {
      what: 'a title that is not text',
      edit: (d) => JSON.stringify({ ...d, title: { html: '<script>alert(1)</script>' } }),
      path: 'title',
      rule: /must be text/,
    },
    {
      what: 'an empty file',
      edit: () => '',
      path: '(file)',
      rule: /not valid JSON/,
    },
  ];

  for (const { what, edit, path, rule } of cases) {
    it(`refuses ${what}`, () => {
      const doc = courtyard();
      const before = JSON.stringify(doc);
      const issues = refusal(edit(doc));
      const match = issues.find((issue) => issue.path === path);
      expect(match, JSON.stringify(issues)).toBeDefined();
      expect(match?.message).toMatch(rule);
      expect(JSON.stringify(doc)).toBe(before);
      expect(({} as Record<string, unknown>).polluted).toBeUndefined();
    });
  }

  it('refuses an oversized picked file before reading it', async () => {
    let read = false;
    const huge = {
      size: MAX_FILE_BYTES + 1,
      text: async () => {
        read = true;
        return '{}';
      },
    } as unknown as Blob;
    const result = await openProjectFile(huge);
    expect(result.ok).toBe(false);
    expect(read).toBe(false);
  });

  it('refuses a damaged share link', () => {
    const result = openShareFragment('#project=%%%not-lz');
    expect(result.ok === false && result.issues[0].path).toBe('(link)');
  });

  it('lists issues as "path: rule" lines, capped', () => {
    const issues = Array.from({ length: 10 }, (_, i) => ({
      path: `cases[${i}].name`,
      message: 'must be text',
    }));
    const lines = describeIssues(issues, 3);
    expect(lines).toEqual([
      'cases[0].name: must be text',
      'cases[1].name: must be text',
      'cases[2].name: must be text',
      '… and 7 more',
    ]);
  });
});

describe('version migration', () => {
  it('runs each step in order and stamps the new version', () => {
    const steps = {
      1: (d: Record<string, unknown>) => ({ ...d, note: 'from 1' }),
      2: (d: Record<string, unknown>) => ({ ...d, note: `${d.note} then 2` }),
    };
    const original = { version: 1, title: 'T' };
    const result = migrateDocument(original, steps, 3);
    expect(result).toEqual({
      ok: true,
      document: { version: 3, title: 'T', note: 'from 1 then 2' },
      from: 1,
    });
    expect(original).toEqual({ version: 1, title: 'T' });
  });

  it('refuses a version with no step to the next', () => {
    const result = migrateDocument({ version: 1 }, {}, 2);
    expect(result).toEqual({
      ok: false,
      issues: [{ path: 'version', message: '1 has no migration to 2' }],
    });
  });

  it('leaves a current document alone', () => {
    const doc = courtyard();
    expect(migrateDocument(doc, {})).toEqual({ ok: true, document: doc });
  });
});

// @vitest-environment jsdom
/**
 * "Setting the wire on the day": the report's table and the workbench section read the core's
 * set-up chart (solveProject on the demo), name the span by its fixings, mark the installation
 * row in words, and say when a row could not be solved. Imperial values use the exact unit
 * definitions (NIST SP 811: 1 ft = 0.3048 m, 1 lbf = 0.45359237 kg × 9.80665 m/s²).
 */
import { cleanup, render, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import demo from '../examples/courtyard-lights.json' with { type: 'json' };
import { type Project, solveProject, validateProject } from '../src/core/index.ts';
import { setUpTable, spanName, temperatureText } from '../src/deliverables/setUpContent.ts';
import { useUiStore } from '../src/state/uiStore.ts';
import { SetUpChart } from '../src/ui/results/SetUpChart.tsx';

function demoProject(): Project {
  const checked = validateProject(demo);
  if (!checked.ok) throw new Error('demo project invalid');
  return structuredClone(checked.project);
}

const project = demoProject();
const results = solveProject(project);

afterEach(() => {
  cleanup();
  useUiStore.setState({ unitSystem: 'si' });
});

describe('set-up chart words and report table', () => {
  it('names a span by its fixings, or by number when a fixing has no name', () => {
    expect(spanName(project, 0)).toBe('Kitchen wall bracket – Studio wall bracket');
    const unnamed = structuredClone(project);
    unnamed.supports[1].label = '  ';
    expect(spanName(unnamed, 0)).toBe('Kitchen wall bracket – Fixing 2');
  });

  it('shows whole degrees, and a decimal only when the temperature has one', () => {
    expect(temperatureText('si', 15)).toBe('15°C');
    expect(temperatureText('si', 12.5)).toBe('12.5°C');
    expect(temperatureText('imperial', -10)).toBe('14°F');
    expect(temperatureText('imperial', 15.5)).toBe('59.9°F');
  });

  it('lists every core row in the report, in US units, with the installation row marked', () => {
    const table = setUpTable(project, results, 'imperial');
    expect(table.rows).toHaveLength(results.setUpChart.length);
    const lbf = 0.45359237 * 9.80665;
    results.setUpChart.forEach((row, i) => {
      const cells = table.rows[i];
      expect(cells[1]).toBe(`${(row.horizontalTension / lbf).toFixed(0)} lbf`);
      expect(cells[2]).toBe(`${(row.maxTension / lbf).toFixed(0)} lbf`);
      expect(cells[3]).toBe(`${(row.sag / 0.3048).toFixed(2)} ft`);
      // The demo sets the wire with its lights hung: the pulse check does not hold.
      expect(row.returnTime).toBeNull();
      expect(cells[4]).toBe('not valid');
    });
    const marked = table.rows.filter((r) => r[0].includes('(installation)'));
    expect(marked.map((r) => r[0])).toEqual(['59°F (installation)']);
  });

  it('says "not solved" for a row the core could not solve', () => {
    const broken = structuredClone(results);
    broken.setUpChart[0].solved = false;
    expect(setUpTable(project, broken, 'si').rows[0]).toEqual([
      '-10°C',
      'not solved',
      '-',
      '-',
      '-',
    ]);
  });
});

describe('set-up chart in the workbench', () => {
  it('shows the core values and marks the installation temperature in words', () => {
    render(<SetUpChart project={project} results={results} />);
    const table = screen.getByRole('table', { name: 'Setting the wire on the day' });
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows).toHaveLength(results.setUpChart.length);
    const install = results.setUpChart.findIndex((r) => r.temperature === 15);
    expect(rows[install].textContent).toContain('installation temperature');
    expect(rows[install].className).toBe('setup-installation');
    const cells = within(rows[install])
      .getAllByRole('cell')
      .map((c) => c.textContent);
    const row = results.setUpChart[install];
    expect(cells).toEqual([
      row.horizontalTension.toFixed(0),
      row.maxTension.toFixed(0),
      row.sag.toFixed(3),
      '—',
    ]);
    expect(rows.filter((r) => r.textContent?.includes('installation temperature'))).toHaveLength(1);
  });

  it('says when a temperature could not be solved instead of showing numbers', () => {
    const broken = structuredClone(results);
    broken.setUpChart[1].solved = false;
    render(<SetUpChart project={project} results={broken} />);
    const rows = within(screen.getByRole('table')).getAllByRole('row').slice(1);
    expect(rows[1].textContent).toContain('Not solved at this temperature.');
  });
});

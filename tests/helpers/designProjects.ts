/** Projects for the design-aid tests (invented for the tests, not a scenario). */
import { readFileSync } from 'node:fs';
import { type Project, validateProject } from '../../src/core/index.ts';

export function loadExample(path: string): Project {
  const checked = validateProject(JSON.parse(readFileSync(path, 'utf8')));
  if (!checked.ok) throw new Error(JSON.stringify(checked.issues));
  return checked.project;
}

/** A 34 m level span 5 m up with festoon lights and a 4.5 m road under it: its window is shut. */
export function roadSquare(): Project {
  const p = structuredClone(loadExample('examples/courtyard-lights.json'));
  p.supports = [
    { x: 0, z: 5, label: 'West facade' },
    { x: 34, z: 5, label: 'East facade' },
  ];
  p.ground = [
    { x: 0, z: 0 },
    { x: 34, z: 0 },
  ];
  p.loads = [
    { type: 'uniform', from: 0.5, to: 33.5, massPerLength: 0.11, diameter: 0.009, label: 'Lights' },
    { type: 'point', x: 17, mass: 1.8, label: 'Lantern' },
  ];
  p.limits = { ...p.limits, zones: [{ from: 10, to: 24, height: 4.5, label: 'Road' }] };
  return p;
}

/** The project pulled at installation horizontal tension H (N), no other target. */
export function atInstallationTension(project: Project, tensionN: number): Project {
  return {
    ...project,
    installation: { ...project.installation, target: { horizontalTension: tensionN } },
  };
}

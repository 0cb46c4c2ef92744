/**
 * The demo project the app opens with: the courtyard festoon-lights example shipped in
 * examples/, passed through the core's project validator like any file a person opens.
 */
import courtyardLights from '../../examples/courtyard-lights.json';
import { type Project, validateProject } from '../core/index.ts';

function loadDemoProject(source: unknown): Project {
  const checked = validateProject(source);
  if (!checked.ok) {
    const reasons = checked.issues.map((issue) => `${issue.path}: ${issue.message}`).join('; ');
    throw new Error(`The demo project examples/courtyard-lights.json is invalid: ${reasons}`);
  }
  return checked.project;
}

export const demoProject: Project = loadDemoProject(courtyardLights);

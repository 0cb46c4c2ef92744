/**
 * The demo project the app opens with: the courtyard festoon-lights example shipped in
 * examples/. The JSON is checked for the project's outer shape before it is trusted as a Project;
 * the core's own validation still runs when it is solved.
 */

import courtyardLights from '../../examples/courtyard-lights.json';
import { PROJECT_FORMAT, type Project } from '../core/project.ts';

function hasProjectShape(value: unknown): value is Project {
  if (typeof value !== 'object' || value === null) return false;
  const candidate = value as Record<string, unknown>;
  return (
    candidate.format === PROJECT_FORMAT &&
    typeof candidate.title === 'string' &&
    Array.isArray(candidate.supports) &&
    Array.isArray(candidate.loads) &&
    Array.isArray(candidate.cases) &&
    typeof candidate.wire === 'object' &&
    typeof candidate.installation === 'object' &&
    typeof candidate.limits === 'object'
  );
}

function loadDemoProject(source: unknown): Project {
  if (!hasProjectShape(source)) {
    throw new Error('examples/courtyard-lights.json is not a sagwright-project document');
  }
  return source;
}

export const demoProject: Project = loadDemoProject(courtyardLights);

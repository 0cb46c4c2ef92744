/**
 * The cautions Sagwright shows in the app, in every exported report and in the CLI table.
 * One source of truth: a short line for the always-visible strip and the full list, plus the
 * cautions a project's own contents call for (cautionsFor).
 */
import type { Project } from './project.ts';

export interface Caution {
  title: string;
  text: string;
}

export const CAUTION_SUMMARY =
  'Check against local codes with a competent, licensed person; use rated fixings; not for lifting or people.';

export const CAUTIONS: readonly Caution[] = [
  {
    title: 'Electric cables',
    text: 'A wire that carries an electric cable is governed by local wiring rules and must be designed, installed and checked by a competent, licensed electrician.',
  },
  {
    title: 'Roads, driveways and paths',
    text: 'Heights over roads, driveways and paths are set by local codes; the clearances entered here are yours to confirm. Allow for vehicles, ladders and people carrying things.',
  },
  {
    title: 'Rated fixings',
    text: 'Every fixing, eye, turnbuckle, grip and the structure behind it must be rated for the support reactions shown, at the angle shown, with its own safety factor.',
  },
  {
    title: 'Not for lifting or people',
    text: 'Sagwright is not for lifting, fall-arrest, zip lines or any system that carries or protects people.',
  },
  {
    title: 'Local codes and licensed practice',
    text: 'Results are an engineering aid, not an approval. Local codes and the judgement of a competent, licensed person govern.',
  },
];

/** Shown whenever the project has a moving load. */
export const MOVING_LOAD_CAUTION: Caution = {
  title: 'Moving loads are goods, never people',
  text: 'A moving load is goods on a pulley or trolley: a basket, a tool bag, a sign being hauled across. The wire and its fixings are not designed for carrying people: nobody may ride on, hang from or be pulled along it. The envelope is for a load moved slowly by hand, without impact, jerks or swinging.',
};

/** The full list for this project: every general caution and those its contents call for. */
export function cautionsFor(project: Pick<Project, 'loads'>): readonly Caution[] {
  const moving = project.loads.some((l) => l.type === 'moving');
  return moving ? [...CAUTIONS, MOVING_LOAD_CAUTION] : CAUTIONS;
}

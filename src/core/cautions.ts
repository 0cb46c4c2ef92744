/**
 * The cautions Sagwright shows in the app, in every exported report and in the CLI table.
 * One source of truth: a short line for the always-visible strip and the full list.
 */

export const CAUTION_SUMMARY =
  'Check against local codes with a competent, licensed person; use rated fixings; not for lifting or people.';

export const CAUTIONS: readonly { title: string; text: string }[] = [
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

/**
 * Ways to start a project: a blank span and a few starter projects of our own, shipped as files
 * in examples/starters/ (so the command line can solve them too). Each is passed through the
 * core's project validator like any file a person opens; a starter that does not validate is a
 * build fault and throws at load.
 */
import blankSpan from '../../examples/starters/blank-span.json' with { type: 'json' };
import courtyardStringLights from '../../examples/starters/courtyard-string-lights.json' with {
  type: 'json',
};
import gardenClothesline from '../../examples/starters/garden-clothesline.json' with {
  type: 'json',
};
import trellisOverPosts from '../../examples/starters/trellis-over-posts.json' with {
  type: 'json',
};
import yardSign from '../../examples/starters/yard-sign.json' with { type: 'json' };
import { type Project, validateProject } from '../core/index.ts';

export interface Starter {
  /** The file's name in examples/starters/, without .json. */
  id: string;
  /** What the button says. */
  name: string;
  /** One line: what it is and what it shows. */
  description: string;
  project: Project;
}

function checked(id: string, source: unknown): Project {
  const result = validateProject(source);
  if (!result.ok) {
    const reasons = result.issues.map((issue) => `${issue.path}: ${issue.message}`).join('; ');
    throw new Error(`The starter project examples/starters/${id}.json is invalid: ${reasons}`);
  }
  return result.project;
}

function starter(id: string, name: string, description: string, source: unknown): Starter {
  return { id, name, description, project: checked(id, source) };
}

/** Two fixings 10 m apart at 3 m, a light wire, no loads, two everyday weather cases. */
export const blankStarter: Starter = starter(
  'blank-span',
  'Blank span',
  'Two fixings 10 m apart, a light steel wire, nothing hung on it yet.',
  blankSpan,
);

export const STARTERS: readonly Starter[] = [
  starter(
    'garden-clothesline',
    'Garden clothesline',
    'A coated line from a house wall to a post, loaded with wet washing on a breezy day.',
    gardenClothesline,
  ),
  starter(
    'courtyard-string-lights',
    'Lights across a courtyard',
    'String lights and a lantern between two walls, kept clear over a seating area.',
    courtyardStringLights,
  ),
  starter(
    'trellis-over-posts',
    'Trellis line over posts',
    'A strained wire over two line posts carrying vines, set by its tension.',
    trellisOverPosts,
  ),
  starter(
    'yard-sign',
    'Sign over a yard',
    'A sign that catches the wind, hung over a vehicle gateway.',
    yardSign,
  ),
];

/** The blank span first, then the starters: what the "New project" dialog offers. */
export const ALL_STARTERS: readonly Starter[] = [blankStarter, ...STARTERS];

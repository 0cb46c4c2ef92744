/**
 * Case colours from the Okabe–Ito palette (Okabe & Ito, "Color Universal Design", 2008),
 * distinguishable with the common colour-vision deficiencies. Yellow is left out: too faint
 * on white. Cases beyond the list reuse it with a different dash.
 */
export const CASE_COLOURS = [
  '#0072B2', // blue
  '#D55E00', // vermillion
  '#009E73', // bluish green
  '#CC79A7', // reddish purple
  '#E69F00', // orange
  '#56B4E9', // sky blue
  '#000000', // black
] as const;

export function caseColour(index: number): string {
  return CASE_COLOURS[index % CASE_COLOURS.length];
}

export const GROUND_FILL = 'rgba(140, 110, 70, 0.35)';
export const GROUND_LINE = '#6b5a3c';
export const ZONE_FILL = 'rgba(230, 159, 0, 0.18)';
export const ZONE_LINE = '#8a5a00';

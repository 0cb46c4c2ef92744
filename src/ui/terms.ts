/** One-line plain explanations of the trade terms the workbench uses. */
export const TERMS = {
  horizontalTension: {
    name: 'horizontal tension',
    text: 'The level part of the wire’s pull. It is the same all along a span, and it is what you set when tensioning.',
  },
  largestTension: {
    name: 'largest tension',
    text: 'The wire’s full pull where it is greatest, at the higher fixing. This is what must stay under the working limit.',
  },
  utilisation: {
    name: 'utilisation',
    text: 'The largest tension as a share of what the wire may carry (breaking load ÷ safety factor). Up to 100 % passes.',
  },
  sag: {
    name: 'sag',
    text: 'How far the wire hangs below the straight line between its fixings, where that drop is largest.',
  },
  cutLength: {
    name: 'cut length',
    text: 'The length of wire between the fixings before it is pulled tight, at the temperature on the day. It stretches when tensioned.',
  },
  axialStiffness: {
    name: 'axial stiffness',
    text: 'How hard the wire is to stretch (EA): the pull that would, in theory, stretch it to twice its length. Higher means less stretch.',
  },
  elementSettings: {
    name: 'the element settings',
    text: 'How the solver models the wire: the theory, and how finely it divides the wire into short pieces (elements). The defaults are accurate for ordinary spans.',
  },
} as const;

export type Term = keyof typeof TERMS;

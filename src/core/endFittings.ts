/**
 * End fittings (terminations) of the wire and their efficiency: the fraction of the wire's
 * minimum breaking load the termination holds. The weaker end governs the working limit:
 * utilisation = T_max · safety factor / (breaking load · efficiency). Values are tagged:
 * [V] read in the named source, [M] from memory (standard named, value unverified), [CP] practice.
 */
import type {
  EndFitting,
  EndFittingKind,
  EndFittingResult,
  EndFittings,
  EndFittingsResult,
} from './project.ts';

export interface EndFittingType {
  kind: Exclude<EndFittingKind, 'custom'>;
  label: string;
  efficiency: number;
  source: string;
}

/** The table of termination efficiencies, each value with its source and tag. */
export const END_FITTING_TYPES: readonly EndFittingType[] = [
  {
    kind: 'ropeGrips',
    label: 'Wire rope grips',
    efficiency: 0.8,
    source: 'EN 13411-5: grip terminations hold at least 80 % of the rope breaking force [M]',
  },
  {
    kind: 'ferruleEye',
    label: 'Ferrule-secured eye',
    efficiency: 0.9,
    source: 'EN 13411-3 (ferrule-secured eye) and EN 13414-1 [M]: about 90 %',
  },
  {
    kind: 'socket',
    label: 'Metal or resin socket',
    efficiency: 1,
    source: 'EN 13411-4: metal and resin socketing, 100 % [M]',
  },
  {
    kind: 'wedgeSocket',
    label: 'Wedge socket',
    efficiency: 0.8,
    source: 'EN 13411-6 (asymmetric) and EN 13411-7 (symmetric) wedge sockets, about 80 % [M]',
  },
  {
    kind: 'handSplice',
    label: 'Hand-spliced eye',
    efficiency: 0.8,
    source: 'EN 13414-1 (slings: hand-spliced eye), 0.8 [M]',
  },
  {
    kind: 'swagedTerminal',
    label: 'Machine-swaged terminal (1x19 strand)',
    efficiency: 1,
    source:
      'swaged terminals on 1x19 strand commonly rated at the full breaking load of the strand [CP]',
  },
];

export const END_FITTING_KINDS: readonly EndFittingKind[] = [
  ...END_FITTING_TYPES.map((t) => t.kind),
  'custom',
];

const NOT_STATED: EndFittingResult = {
  kind: 'notStated',
  label: 'Not stated (taken as full strength)',
  efficiency: 1,
  source: 'no end fitting stated: no reduction applied',
};

export function resolveEndFitting(fitting: EndFitting): EndFittingResult {
  if (fitting.kind === 'custom') {
    return {
      kind: 'custom',
      label: 'My own value',
      efficiency: fitting.efficiency ?? 1,
      source: 'entered by user',
    };
  }
  const type = END_FITTING_TYPES.find((t) => t.kind === fitting.kind);
  if (!type) return NOT_STATED;
  return { kind: type.kind, label: type.label, efficiency: type.efficiency, source: type.source };
}

/** Both ends resolved; without `endFittings` both are full strength and `stated` is false. */
export function resolveEndFittings(fittings: EndFittings | undefined): EndFittingsResult {
  const start = fittings ? resolveEndFitting(fittings.start) : NOT_STATED;
  const end = fittings ? resolveEndFitting(fittings.end) : NOT_STATED;
  const governing = end.efficiency < start.efficiency ? 'end' : 'start';
  return {
    stated: fittings !== undefined,
    start,
    end,
    efficiency: Math.min(start.efficiency, end.efficiency),
    governing,
  };
}

/**
 * The wire's linear-elastic range: the largest strain ε = T / EA up to which the straight-line
 * stretch model (ds = ds₀ (1 + T/EA)) describes the wire. Steel rope and strand: 0.75 %, about
 * half to two-thirds of the breaking force for the catalogue's constructions [M]. Fibre rope:
 * half its strain at break (polyester 15–25 %, nylon 25–35 % [V]). A custom wire: the strain at
 * half its breaking load on its own straight line, ½ · breaking load / EA.
 */
import type { WireProperties } from './wireCatalog.ts';

export interface StrainLimit {
  /** Largest strain the model is valid for (fraction, 0.0075 = 0.75 %). */
  strain: number;
  /** Where the limit comes from, in words, for the message. */
  basis: string;
}

export const STEEL_ELASTIC_STRAIN = 0.0075;
export const POLYESTER_ELASTIC_STRAIN = 0.1;
export const NYLON_ELASTIC_STRAIN = 0.15;

export function elasticStrainLimit(wire: WireProperties): StrainLimit {
  switch (wire.kind) {
    case 'galvanised steel':
    case 'stainless steel':
    case 'coated clothesline':
      return { strain: STEEL_ELASTIC_STRAIN, basis: 'steel wire rope' };
    case 'polyester rope':
      return {
        strain: POLYESTER_ELASTIC_STRAIN,
        basis: 'polyester rope, half its stretch at break',
      };
    case 'nylon rope':
      return { strain: NYLON_ELASTIC_STRAIN, basis: 'nylon rope, half its stretch at break' };
    default:
      return {
        strain: (0.5 * wire.breakingLoad) / wire.axialStiffness,
        basis: 'this wire at half its breaking load',
      };
  }
}

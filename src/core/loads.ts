/**
 * Loads per metre for one weather case (SI). Wire: self weight w = m g and radial ice
 * ρ_ice g π t (d + t) per metre of wire; wind q C_f (d + 2t) with q = ρ_air V² / 2 (N/m).
 * Hung uniform loads act per horizontal metre (with ice and wind on their own diameter);
 * point loads are vertical forces (N). Cases may leave the hung loads out. Moving loads are
 * not here: movingLoads.ts places them one position at a time.
 */
import type { Environment, Load, WeatherCase } from './project.ts';
import type { WireProperties } from './wireCatalog.ts';

/** A hung uniform load resolved for one case, per horizontal metre. */
export interface UniformLoadPerMetre {
  from: number;
  to: number;
  verticalNPerM: number;
  lateralNPerM: number;
}

export interface PointForce {
  x: number;
  forceN: number;
}

export interface CaseLoads {
  /** Wire weight incl. ice, N per metre of wire (unstressed, installation temperature). */
  wireWeightNPerM: number;
  /** Wind on the (iced) wire, N per metre of wire. */
  wireWindNPerM: number;
  uniform: UniformLoadPerMetre[];
  points: PointForce[];
}

export interface LoadState {
  temperature: number;
  iceThicknessM: number;
  windSpeedMPerS: number;
  withLoads: boolean;
}

/** Radial ice weight per metre on a round member of diameter d (m): ρ g π t (d + t). */
export function iceWeightNPerM(env: Environment, diameterM: number, iceM: number): number {
  return env.iceDensity * env.gravity * Math.PI * iceM * (diameterM + iceM);
}

/** Wind load per metre on a round member of diameter d with radial ice t: q C_f (d + 2t). */
export function windLoadNPerM(
  env: Environment,
  diameterM: number,
  iceM: number,
  speed: number,
): number {
  const pressurePa = 0.5 * env.airDensity * speed * speed;
  return pressurePa * env.dragCoefficient * (diameterM + 2 * iceM);
}

export function loadStateOfCase(weather: WeatherCase): LoadState {
  return {
    temperature: weather.temperature,
    iceThicknessM: weather.iceThickness,
    windSpeedMPerS: weather.windSpeed,
    withLoads: weather.withLoads,
  };
}

/** Resolve the project's loads for one state into per-metre and point forces. */
export function caseLoads(
  wire: WireProperties,
  loads: readonly Load[],
  state: LoadState,
  env: Environment,
): CaseLoads {
  const t = state.iceThicknessM;
  const V = state.windSpeedMPerS;
  const result: CaseLoads = {
    wireWeightNPerM: wire.massPerLength * env.gravity + iceWeightNPerM(env, wire.diameter, t),
    wireWindNPerM: windLoadNPerM(env, wire.diameter, t, V),
    uniform: [],
    points: [],
  };
  if (!state.withLoads) return result;
  for (const load of loads) {
    if (load.type === 'point') {
      const forceN = load.force ?? (load.mass ?? 0) * env.gravity;
      result.points.push({ x: load.x, forceN });
    } else if (load.type === 'uniform') {
      const d = load.diameter ?? 0;
      const hasArea = d > 0;
      result.uniform.push({
        from: load.from,
        to: load.to,
        verticalNPerM: load.massPerLength * env.gravity + (hasArea ? iceWeightNPerM(env, d, t) : 0),
        lateralNPerM: hasArea ? windLoadNPerM(env, d, t, V) : 0,
      });
    }
  }
  return result;
}

/** Positions where loads start, stop or act: mesh breakpoints (all loads, any case). */
export function loadBreakpoints(loads: readonly Load[]): number[] {
  const points: number[] = [];
  for (const load of loads) {
    if (load.type === 'point') points.push(load.x);
    else if (load.type === 'uniform') points.push(load.from, load.to);
  }
  return points;
}

/**
 * Loads per metre for one weather case (SI). Wire: self weight w = m g and radial ice
 * ρ_ice g π t (d + t) per metre of wire; wind q C_f (d + 2t) with q = ρ_air V² / 2 (N/m).
 * Hung uniform loads: their own mass per horizontal metre, ice and wind on their own diameter
 * per metre of cable along the wire. Point loads: a vertical force (N) and the wind on their
 * projected area, q C_d A (N, sideways). Cases may leave the hung loads out.
 */
import type { Environment, Load, PointLoad, WeatherCase } from './project.ts';
import type { WireProperties } from './wireCatalog.ts';

/** A hung uniform load resolved for one case. */
export interface UniformLoadPerMetre {
  from: number;
  to: number;
  /** Its own weight, N per horizontal metre. */
  verticalNPerM: number;
  /** Ice on its diameter, N per metre of cable along the wire (downward). */
  iceNPerM: number;
  /** Wind on its (iced) diameter, N per metre of cable along the wire (sideways). */
  windNPerM: number;
}

export interface PointForce {
  x: number;
  /** Downward force, N. */
  forceN: number;
  /** Wind on the item's projected area, N (sideways, +y). */
  lateralN: number;
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

/** Wind force on a hung item of projected area A (m²): q C_d A, C_d its own or the environment's. */
export function pointWindN(env: Environment, load: PointLoad, speed: number): number {
  const areaM2 = load.windArea ?? 0;
  if (areaM2 <= 0 || speed <= 0) return 0;
  const pressurePa = 0.5 * env.airDensity * speed * speed;
  return pressurePa * (load.dragCoefficient ?? env.dragCoefficient) * areaM2;
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
      result.points.push({ x: load.x, forceN, lateralN: pointWindN(env, load, V) });
    } else {
      const d = load.diameter ?? 0;
      const hasArea = d > 0;
      result.uniform.push({
        from: load.from,
        to: load.to,
        verticalNPerM: load.massPerLength * env.gravity,
        iceNPerM: hasArea ? iceWeightNPerM(env, d, t) : 0,
        windNPerM: hasArea ? windLoadNPerM(env, d, t, V) : 0,
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
    else points.push(load.from, load.to);
  }
  return points;
}

/** Where hung items hang below the wire in a state: point drops and uniform-load drops (m). */
export interface HungDrops {
  points: { x: number; dropM: number }[];
  ranges: { from: number; to: number; dropM: number }[];
}

export function hungDrops(loads: readonly Load[], withLoads: boolean): HungDrops {
  const drops: HungDrops = { points: [], ranges: [] };
  if (!withLoads) return drops;
  for (const load of loads) {
    const dropM = load.drop ?? 0;
    if (!(dropM > 0)) continue;
    if (load.type === 'point') drops.points.push({ x: load.x, dropM });
    else drops.ranges.push({ from: load.from, to: load.to, dropM });
  }
  return drops;
}

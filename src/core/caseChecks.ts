/**
 * Checks and outputs of one solved state: tensions, utilisation = T_max · SF / breaking load,
 * sag from the chord, lowest point, clearance over the ground line and in each zone, sideways
 * swing, support reactions (the wire's pull on each support), and a sampled profile.
 */

import { clearanceMessage, tensionMessage, zoneMessage } from './checkMessages.ts';
import type { HungDrops } from './loads.ts';
import type {
  Attachment,
  CaseProfile,
  CaseResult,
  ClearanceZone,
  GroundPoint,
  SpanResult,
  SupportReaction,
  Theory,
} from './project.ts';
import {
  heightAt,
  largestSwing,
  largestTension,
  minimumAboveLine,
  type ShapePoint,
  slopesAt,
  tensionAt,
} from './spanGeometry.ts';
import type { SpanModel } from './spanModel.ts';
import type { StrainLimit } from './strainLimit.ts';

export interface SolvedSpan {
  span: SpanModel;
  tensionN: number;
}

export interface CheckInput {
  /** The state's identity in the results: see caseIds.ts. */
  id: string;
  name: string;
  temperature: number;
  spans: SolvedSpan[];
  /** Each support's attachment ("end" for the first and last). */
  attachments: readonly (Attachment | 'end')[];
  /** Point loads placed exactly at each support, N: downward and sideways. */
  supportForcesN: readonly number[];
  supportLateralN: readonly number[];
  ground: readonly GroundPoint[];
  /** Hung items that hang below the wire in this state (clearance is measured to them). */
  drops: HungDrops;
  zones: readonly ClearanceZone[];
  safetyFactor: number;
  minClearance: number;
  breakingLoadN: number;
  axialStiffnessN: number;
  strainLimit: StrainLimit;
  theory: Theory;
  /** Efficiency of the weaker end fitting, 0–1 (1: as strong as the wire). */
  endFittingEfficiency: number;
  iterations: number;
  messages: string[];
  solved: boolean;
}

const PROFILE_POINTS_PER_SPAN = 200;
/** Profile points of one state over all spans: the plot and the CSV never get more rows. */
export const PROFILE_POINTS_PER_STATE = 2000;

interface GroundPiece {
  a: number;
  b: number;
  x: number;
  z: number;
  slope: number;
}

/** The ground line as pieces z = z₀ + slope (x − x₀) on [a, b], flat beyond its ends. */
function groundPieces(ground: readonly GroundPoint[]): GroundPiece[] {
  const line = ground.length > 0 ? ground : [{ x: 0, z: 0 }];
  const pieces: GroundPiece[] = [];
  pieces.push({ a: -Infinity, b: line[0].x, x: line[0].x, z: line[0].z, slope: 0 });
  for (let i = 0; i + 1 < line.length; i++) {
    const slope = (line[i + 1].z - line[i].z) / (line[i + 1].x - line[i].x);
    pieces.push({ a: line[i].x, b: line[i + 1].x, x: line[i].x, z: line[i].z, slope });
  }
  const end = line[line.length - 1];
  pieces.push({ a: end.x, b: Infinity, x: end.x, z: end.z, slope: 0 });
  return pieces;
}

function groundAt(pieces: readonly GroundPiece[], x: number): number {
  const piece = pieces.find((p) => x >= p.a && x <= p.b) ?? pieces[pieces.length - 1];
  return piece.z + piece.slope * (x - piece.x);
}

/**
 * Smallest distance from the lowest of the wire and its hung items down to the ground over
 * [from, to] (ground piecewise linear, flat beyond): z(x) − ground(x), and z(x) − drop − ground(x)
 * under a hung item that hangs `drop` below the wire (over a uniform load's [from, to], or at a
 * point load's x).
 */
export function clearanceOver(
  spans: readonly SolvedSpan[],
  ground: readonly GroundPoint[],
  from: number,
  to: number,
  drops: HungDrops = NO_DROPS,
): ShapePoint {
  const pieces = groundPieces(ground);
  let best = { x: from, value: Number.POSITIVE_INFINITY };
  const below = (a: number, b: number, dropM: number) => {
    for (const { span, tensionN } of spans) {
      for (const piece of pieces) {
        const lo = Math.max(a, piece.a, span.x0);
        const hi = Math.min(b, piece.b, span.x1);
        if (!(hi >= lo)) continue;
        const m = minimumAboveLine(span, tensionN, lo, hi, piece.x, piece.z + dropM, piece.slope);
        if (m.value < best.value) best = m;
      }
    }
  };
  below(from, to, 0);
  for (const range of drops.ranges)
    below(Math.max(from, range.from), Math.min(to, range.to), range.dropM);
  for (const point of drops.points) {
    if (point.x < from || point.x > to) continue;
    const span = spans.find((s) => point.x >= s.span.x0 && point.x <= s.span.x1);
    if (!span) continue;
    const value =
      heightAt(span.span, span.tensionN, point.x) - point.dropM - groundAt(pieces, point.x);
    if (value < best.value) best = { x: point.x, value };
  }
  return best;
}

const NO_DROPS: HungDrops = { points: [], ranges: [] };

function spanResult({ span, tensionN }: SolvedSpan): SpanResult {
  const sag = minimumAboveLine(span, tensionN, span.x0, span.x1, span.x0, span.z0, span.chordSlope);
  const low = minimumAboveLine(span, tensionN, span.x0, span.x1, span.x0, 0, 0);
  return { horizontalTension: tensionN, sag: -sag.value, lowestPoint: { x: low.x, z: low.value } };
}

/** Sag of one solved span, m. */
export function largestSpanSag({ span, tensionN }: SolvedSpan): number {
  return -minimumAboveLine(span, tensionN, span.x0, span.x1, span.x0, span.z0, span.chordSlope)
    .value;
}

/** Largest sag over the spans of a solved state, m. */
export function largestSag(spans: readonly SolvedSpan[]): number {
  return Math.max(...spans.map(largestSpanSag));
}

/** Largest tension over the spans of a solved state, N. */
export function largestStateTension(spans: readonly SolvedSpan[]): number {
  return Math.max(...spans.map((s) => largestTension(s.span, s.tensionN)));
}

/** Angle (degrees) of a wire direction below the horizontal: atan2(down, along the ground). */
function angleBelow(down: number, dy: number): number {
  return (Math.atan2(down, Math.hypot(1, dy)) * 180) / Math.PI;
}

interface SupportSums {
  h: number;
  v: number;
  l: number;
  before?: { angle: number; tension: number };
  after?: { angle: number; tension: number };
}

/**
 * The wire's pull on each support: at the start of span j it pulls with H (1, y', z') toward
 * the span, at its end with H (−1, −y', −z'); a point load placed at a support adds to its
 * downward pull (and its wind to the sideways pull). Each side's wire tension and angle below the horizontal are reported as well.
 */
function reactions(input: CheckInput): SupportReaction[] {
  const sums: SupportSums[] = input.attachments.map((_, i) => ({
    h: 0,
    v: input.supportForcesN[i] ?? 0,
    l: input.supportLateralN[i] ?? 0,
  }));
  input.spans.forEach(({ span, tensionN: H }, j) => {
    const start = slopesAt(span, H, 0, -1);
    const end = slopesAt(span, H, span.elementLength.length - 1, 1);
    sums[j].h += H;
    sums[j].v -= H * start.dz;
    sums[j].l += H * start.dy;
    sums[j].after = {
      angle: angleBelow(-start.dz, start.dy),
      tension: H * Math.hypot(1, start.dz, start.dy),
    };
    sums[j + 1].h -= H;
    sums[j + 1].v += H * end.dz;
    sums[j + 1].l -= H * end.dy;
    sums[j + 1].before = {
      angle: angleBelow(end.dz, end.dy),
      tension: H * Math.hypot(1, end.dz, end.dy),
    };
  });
  return sums.map(({ h, v, l, before, after }, i) => ({
    horizontal: h,
    vertical: v,
    lateral: l,
    resultant: Math.hypot(h, v, l),
    angle: (Math.atan2(v, Math.hypot(h, l)) * 180) / Math.PI,
    attachment: input.attachments[i],
    ...(before ? { angleBefore: before.angle, tensionBefore: before.tension } : {}),
    ...(after ? { angleAfter: after.angle, tensionAfter: after.tension } : {}),
  }));
}

/**
 * Wire profile at the vertex nodes, thinned to about PROFILE_POINTS_PER_SPAN per span and
 * PROFILE_POINTS_PER_STATE over all spans.
 */
export function sampleProfile(spans: readonly SolvedSpan[]): CaseProfile {
  const profile: CaseProfile = { x: [], z: [], y: [], tension: [] };
  const perSpan = Math.max(
    10,
    Math.min(PROFILE_POINTS_PER_SPAN, Math.floor(PROFILE_POINTS_PER_STATE / spans.length)),
  );
  spans.forEach(({ span, tensionN: H }, j) => {
    const ne = span.elementLength.length;
    const stride = Math.max(1, Math.ceil(ne / perSpan));
    const vertices: number[] = [];
    for (let k = j === 0 ? 0 : stride; k < ne; k += stride) vertices.push(k);
    vertices.push(ne);
    for (const vertex of vertices) {
      const x = span.mesh.vertexX[vertex];
      profile.x.push(x);
      profile.z.push(
        span.z0 + span.chordSlope * (x - span.x0) - span.v1[vertex * span.mesh.order] / H,
      );
      profile.y.push(span.y1[vertex * span.mesh.order] / H);
      profile.tension.push(tensionAt(span, H, Math.min(vertex, ne - 1), vertex === ne ? 1 : -1));
    }
  });
  return profile;
}

const fmt = (value: number, digits = 2) => value.toFixed(digits);

/** Above this sag/span the parabolic theory's H is visibly low (0.3 % at 5 %, 4.7 % at 20 %). */
export const PARABOLIC_SAG_RATIO_LIMIT = 0.05;

function parabolicNotes(spans: readonly SolvedSpan[], results: readonly SpanResult[]): string[] {
  const notes: string[] = [];
  results.forEach((r, j) => {
    const ratio = r.sag / (spans[j].span.x1 - spans[j].span.x0);
    if (ratio > PARABOLIC_SAG_RATIO_LIMIT)
      notes.push(
        `Parabolic theory: the sag of span ${j + 1} is ${fmt(ratio * 100, 1)} % of the span (above 5 %); the parabola under-estimates the tension as sag grows (about 5 % low at 20 %): use the exact theory.`,
      );
  });
  return notes;
}

/** Build the contract's case result from a solved state. */
export function checkCase(input: CheckInput): CaseResult {
  const { spans } = input;
  const spanResults = spans.map(spanResult);
  const maxTension = largestStateTension(spans);
  const horizontalTension = Math.max(...spans.map((s) => s.tensionN));
  const efficiency = input.endFittingEfficiency;
  const capacityN = input.breakingLoadN * efficiency;
  const utilisation = (maxTension * input.safetyFactor) / capacityN;
  const lowest = spanResults.reduce((a, b) =>
    b.lowestPoint.z < a.lowestPoint.z ? b : a,
  ).lowestPoint;
  const clearance = clearanceOver(spans, input.ground, -Infinity, Infinity, input.drops).value;
  const swing = Math.max(...spans.map((s) => Math.abs(largestSwing(s.span, s.tensionN).value)));
  const messages = [...input.messages];
  const tensionWords = tensionMessage({
    maxTension,
    breakingLoadN: input.breakingLoadN,
    efficiency,
    safetyFactor: input.safetyFactor,
  });
  if (tensionWords) messages.push(tensionWords);
  if (input.theory === 'parabolic') messages.push(...parabolicNotes(spans, spanResults));
  const clearanceWords = clearanceMessage(clearance, input.minClearance);
  if (clearanceWords) messages.push(clearanceWords);
  const strain = maxTension / input.axialStiffnessN;
  const beyondElastic = strain > input.strainLimit.strain;
  if (beyondElastic)
    messages.push(
      `Not valid: the wire stretches ${fmt(100 * strain)} % under its largest tension, beyond its linear-elastic range (${fmt(100 * input.strainLimit.strain)} % for ${input.strainLimit.basis}). This model assumes a straight-line stretch, so the tension, sag and clearance shown here cannot be relied on.`,
    );
  const zoneClearances = input.zones.map((zone, i) => {
    const c = clearanceOver(spans, input.ground, zone.from, zone.to, input.drops).value;
    const label = zone.label ?? `Zone ${i + 1}`;
    const ok = c >= zone.height;
    const zoneWords = zoneMessage({ label, clearance: c, required: zone.height });
    if (zoneWords) messages.push(zoneWords);
    return { label, clearance: c, required: zone.height, ok };
  });
  const ok =
    input.solved &&
    !beyondElastic &&
    utilisation <= 1 &&
    clearance >= input.minClearance &&
    zoneClearances.every((z) => z.ok);
  return {
    id: input.id,
    name: input.name,
    solved: input.solved,
    horizontalTension,
    maxTension,
    utilisation,
    sag: Math.max(...spanResults.map((s) => s.sag)),
    lowestPoint: lowest,
    clearance,
    zoneClearances,
    swing,
    strain,
    spans: spanResults,
    supports: reactions(input),
    ok,
    messages,
    discretisationError: 0,
    iterations: input.iterations,
    temperature: input.temperature,
    profile: sampleProfile(spans),
  };
}

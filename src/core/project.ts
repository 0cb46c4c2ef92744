/**
 * The project document (file format "sagwright-project", version 2) and the results object.
 * SI units everywhere: m, kg, N, °C, m/s. This is a contract shared by the CLI, the core,
 * the UI, saved files and share links: extend it, never rename or re-unit a field.
 */
import type { AsBuiltResult } from './asBuilt.ts';

export const PROJECT_FORMAT = 'sagwright-project';
export const PROJECT_VERSION = 2;

export interface SupportPoint {
  /** Position along the span from the first support, m. */
  x: number;
  /** Height above the ground datum, m. */
  z: number;
  label?: string;
  /** Intermediate support only: how the wire is held there (default "clamped"). */
  attachment?: Attachment;
}

/**
 * How an intermediate support holds the wire. clamped: each span keeps its own cut length.
 * pulley: the wire runs over a pulley, sheave or smooth eye; tension equal on both sides and
 * only the section's total cut length is fixed. swingLink: the wire is clamped to a link free
 * to swing along the line; horizontal tension equal on both sides.
 */
export type Attachment = 'clamped' | 'pulley' | 'swingLink';

export const ATTACHMENTS: readonly Attachment[] = ['clamped', 'pulley', 'swingLink'];

export interface GroundPoint {
  x: number;
  z: number;
}

export interface CustomWire {
  label: string;
  /** Outer diameter, m. */
  diameter: number;
  /** kg/m. */
  massPerLength: number;
  /** EA, N. */
  axialStiffness: number;
  /** 1/K. */
  thermalExpansion: number;
  /** Minimum breaking load, N. */
  breakingLoad: number;
}

export interface CatalogWireRef {
  catalogId: string;
}

export type WireSpec = CatalogWireRef | CustomWire;

export interface PointLoad {
  type: 'point';
  /** m along the span. */
  x: number;
  /** kg (exactly one of mass or force). */
  mass?: number;
  /** N, downward. */
  force?: number;
  /** Projected area that catches the wind, m² (optional; none by default). */
  windArea?: number;
  /** Drag coefficient of that area (optional; default the environment's). */
  dragCoefficient?: number;
  /** How far the item's lowest part hangs below the wire, m (optional; 0). */
  drop?: number;
  label?: string;
}

export interface UniformLoad {
  type: 'uniform';
  from: number;
  to: number;
  /** kg per horizontal metre. */
  massPerLength: number;
  /** Diameter that catches wind and ice, m (optional). */
  diameter?: number;
  /** How far its lowest part hangs below the wire, m (optional; 0). */
  drop?: number;
  label?: string;
}

/**
 * A point load that travels along [from, to] (a pulley basket, a trolley, a sign being hauled
 * across). It is not on the wire when the wire is set up; each case reports its envelope.
 */
export interface MovingLoad {
  type: 'moving';
  /** m along the line. */
  from: number;
  to: number;
  /** kg (exactly one of mass or force). */
  mass?: number;
  /** N, downward. */
  force?: number;
  label?: string;
}

export type Load = PointLoad | UniformLoad | MovingLoad;

export interface InstallationTarget {
  horizontalTension?: number;
  maxTension?: number;
  sag?: number;
  unstressedLength?: number;
  /** Sag target: which span (0-based); default the longest. */
  span?: number;
  /** State the target in this named case instead of the installation state. */
  case?: string;
}

export interface Installation {
  temperature: number;
  withLoads: boolean;
  target: InstallationTarget;
}

export interface WeatherCase {
  name: string;
  temperature: number;
  /** Radial ice thickness, m. */
  iceThickness: number;
  /** Wind speed, m/s, blowing across the span (+y). */
  windSpeed: number;
  withLoads: boolean;
}

export interface ClearanceZone {
  from: number;
  to: number;
  /** Required clearance of the wire above the ground in this zone, m. */
  height: number;
  label?: string;
}

/** Termination kinds with a tabulated efficiency (endFittings.ts), or "custom" (own value). */
export type EndFittingKind =
  | 'ropeGrips'
  | 'ferruleEye'
  | 'socket'
  | 'wedgeSocket'
  | 'handSplice'
  | 'swagedTerminal'
  | 'custom';

export interface EndFitting {
  kind: EndFittingKind;
  /** Fraction of the wire's breaking load the fitting holds, 0–1: only (and required) for custom. */
  efficiency?: number;
}

/** The fittings at the first (start) and last (end) support. */
export interface EndFittings {
  start: EndFitting;
  end: EndFitting;
}

export interface Limits {
  safetyFactor: number;
  minClearance: number;
  zones?: ClearanceZone[];
  /** Optional; absent means no reduction (terminations as strong as the wire), said in results. */
  endFittings?: EndFittings;
}

export type Theory = 'exact' | 'parabolic';

export interface ModelSettings {
  theory: Theory;
  elementOrder: 1 | 2;
  elementsPerSpan: number;
}

export interface Environment {
  gravity: number;
  airDensity: number;
  iceDensity: number;
  dragCoefficient: number;
}

/** Who prepared, checked or approved the design, and when (ISO date, YYYY-MM-DD). */
export interface ReportSignatory {
  name: string;
  date?: string;
}

/** One line of the report's revision table. */
export interface ReportRevision {
  revision: string;
  /** YYYY-MM-DD. */
  date: string;
  description: string;
}

/** The design record the PDF report prints: reference, people, revisions. Optional. */
export interface ReportRecord {
  reference?: string;
  client?: string;
  site?: string;
  preparedBy?: ReportSignatory;
  checkedBy?: ReportSignatory;
  approvedBy?: ReportSignatory;
  /** Oldest first; the last one is the report's current revision. */
  revisions?: ReportRevision[];
}

export interface Project {
  format: typeof PROJECT_FORMAT;
  version: number;
  title: string;
  supports: SupportPoint[];
  ground?: GroundPoint[];
  wire: WireSpec;
  loads: Load[];
  installation: Installation;
  cases: WeatherCase[];
  limits: Limits;
  model?: Partial<ModelSettings>;
  environment?: Partial<Environment>;
  report?: ReportRecord;
}

export const DEFAULT_MODEL: ModelSettings = {
  theory: 'exact',
  elementOrder: 1,
  elementsPerSpan: 200,
};

/** Standard gravity (CGPM 1901, exact); ISA sea-level air; glaze ice; stranded wire drag. */
export const DEFAULT_ENVIRONMENT: Environment = {
  gravity: 9.80665,
  airDensity: 1.225,
  iceDensity: 900,
  dragCoefficient: 1.0,
};

// ---------------------------------------------------------------- results

export interface Point2 {
  x: number;
  z: number;
}

export interface ZoneClearance {
  label: string;
  clearance: number;
  required: number;
  ok: boolean;
}

export interface SpanResult {
  horizontalTension: number;
  sag: number;
  lowestPoint: Point2;
}

export interface SupportReaction {
  /** Net pull along the line, N, signed positive toward increasing x. */
  horizontal: number;
  /** Downward pull, N (wire and any point load placed at the support). */
  vertical: number;
  /** Sideways pull in the wind direction, N. */
  lateral: number;
  resultant: number;
  /** Angle of the net pull below the horizontal, degrees. */
  angle: number;
  /** "end" for the first and last support, else the support's attachment. */
  attachment: Attachment | 'end';
  /** Angle of the wire below the horizontal on the side toward the previous support, degrees. */
  angleBefore?: number;
  /** Angle of the wire below the horizontal on the side toward the next support, degrees. */
  angleAfter?: number;
  /** Wire tension at the support on the side toward the previous support, N. */
  tensionBefore?: number;
  /** Wire tension at the support on the side toward the next support, N. */
  tensionAfter?: number;
}

/** Sampled wire profile for plots and exports (not part of the JSON contract's required set). */
export interface CaseProfile {
  x: number[];
  z: number[];
  y: number[];
  tension: number[];
}

/** The envelope of one moving load over its path in one case (positions in m along the line). */
export interface MovingLoadResult {
  label: string;
  maxTension: number;
  maxTensionAt: number;
  /** Lowest clearance of the wire over the ground line while the load travels, m. */
  clearance: number;
  clearanceAt: number;
  utilisation: number;
  zoneClearances: (ZoneClearance & { at: number })[];
  ok: boolean;
  /** Number of positions solved (scan and refinement). */
  positions: number;
  /** Lowest and highest wire height at each x over the scanned positions (for the plot). */
  band: { x: number[]; zLow: number[]; zHigh: number[] };
}

export interface CaseResult {
  /** Identity of the state: "installation", or "cases[i]" for the document's i-th weather case
   * (0-based). Names are labels only and may repeat the installation's. */
  id: string;
  name: string;
  /** False when the state could not be solved; messages say why. */
  solved: boolean;
  horizontalTension: number;
  maxTension: number;
  utilisation: number;
  sag: number;
  lowestPoint: Point2;
  clearance: number;
  zoneClearances: ZoneClearance[];
  swing: number;
  /** Largest strain of the wire, T_max / EA (fraction); above its elastic range ok is false. */
  strain: number;
  spans: SpanResult[];
  supports: SupportReaction[];
  ok: boolean;
  messages: string[];
  discretisationError: number;
  iterations: number;
  temperature: number;
  profile?: CaseProfile;
  /** One entry per moving load when the case carries the hung loads (else empty). */
  movingLoads?: MovingLoadResult[];
}

export interface Governing {
  tension: string;
  clearance: string;
}

/** One row of the set-up chart: what the wire shows when tensioned at this temperature. */
export interface SetUpRow {
  temperature: number;
  solved: boolean;
  horizontalTension: number;
  maxTension: number;
  /** Sag of the reference span (the sag target's span, else the longest), m. */
  sag: number;
  /**
   * Time for a pulse to run to the far fixing and back once, 2 ∫ ds / c (s); null when hung
   * loads are on the wire while it is set (the pulse would reflect off them).
   */
  returnTime: number | null;
}

/** One end's fitting as the results state it (table entry, own value, or not stated). */
export interface EndFittingResult {
  kind: EndFittingKind | 'notStated';
  label: string;
  efficiency: number;
  source: string;
}

export interface EndFittingsResult {
  /** False when the project names no end fittings: no reduction is applied. */
  stated: boolean;
  start: EndFittingResult;
  end: EndFittingResult;
  /** The weaker end's efficiency, used in every case's utilisation. */
  efficiency: number;
  /** Which end governs ("start" on a tie). */
  governing: 'start' | 'end';
}

/** The mesh the results come from and how its discretisation error compares with the target. */
export interface MeshResult {
  /** Each element of the project's mesh split into this many (1: the mesh as set). */
  refinement: number;
  /** Elements in the most finely meshed span. */
  elementsPerSpan: number;
  /** Relative error the estimate must fall below (automatic refinement stops there). */
  errorTarget: number;
  /** The largest estimate over the cases, and whether it is below the target. */
  largestError: number;
  reached: boolean;
}

export interface ProjectResults {
  unstressedLength: number;
  cases: CaseResult[];
  /** Names of the governing cases (labels; see governingIds for their identities). */
  governing: Governing;
  /** Identities (CaseResult.id) of the governing cases. */
  governingIds: Governing;
  /** What to set on the day at other temperatures (installation loads, cut length fixed). */
  setUpChart: SetUpRow[];
  /** The span whose sag the set-up chart lists (0-based). */
  setUpSpan: number;
  /** The as-built check, when a site measurement was given (CLI --as-built, workbench). */
  asBuilt?: AsBuiltResult;
  /** The end fittings and the efficiency the utilisation uses. */
  endFittings: EndFittingsResult;
  mesh: MeshResult;
  /** Notes on the whole solve, in words (e.g. a mesh coarsened to the work budget). */
  notices: string[];
  /** Present and true only when the solver failed inside; every case then says so. */
  internalError?: boolean;
}

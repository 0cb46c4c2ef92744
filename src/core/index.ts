/** Public entry of the Sagwright core: the project contract, the solver, the catalogue, validation. */

export {
  AS_BUILT_KINDS,
  type AsBuiltKind,
  type AsBuiltMeasurement,
  type AsBuiltResult,
  solveAsBuilt,
  validateAsBuilt,
} from './asBuilt.ts';
export { caseIndexOfId, caseResultId, INSTALLATION_ID, weatherCaseOfId } from './caseIds.ts';
export {
  CAUTION_SUMMARY,
  CAUTIONS,
  type Caution,
  cautionsFor,
  MOVING_LOAD_CAUTION,
} from './cautions.ts';
export {
  clearanceMessage,
  SI_WORDING,
  type TensionFacts,
  tensionMessage,
  type Wording,
  zoneMessage,
} from './checkMessages.ts';
export { type DaySetting, type SagPosition, settingAt } from './design/daySetting.ts';
export {
  type TensionWindow,
  tensionWindow,
  tensionWindowWithFacts,
  type WindowEnd,
} from './design/tensionWindow.ts';
export {
  type AdviceFact,
  adviceWords,
  windowTensionSpans,
  windowTensionWords,
} from './design/windowAdvice.ts';
export { type WindowCurve, windowCurve, windowPosition } from './design/windowPosition.ts';
export {
  chooseWire,
  chooseWires,
  SUGGESTION_RULE,
  type WireChoice,
  type WireFamily,
  wireFamily,
} from './design/wireChooser.ts';
export {
  END_FITTING_KINDS,
  END_FITTING_TYPES,
  type EndFittingType,
  resolveEndFittings,
} from './endFittings.ts';
export { RANGES } from './fieldRanges.ts';
export {
  type Migration,
  migrateProjectDocument,
  migrationNotes,
  PROJECT_MIGRATIONS,
  type ProjectDocument,
} from './migrateProject.ts';
export { movingLoadFailures } from './movingLoads.ts';
export * from './project.ts';
export { INTERNAL_ERROR_MESSAGE } from './resultGuard.ts';
export { type SolveOptions, solveProject } from './solveProject.ts';
export { type ValidationIssue, type ValidationResult, validateProject } from './validateProject.ts';
export { findCatalogWire, resolveWire, WIRE_CATALOG, type WireProperties } from './wireCatalog.ts';

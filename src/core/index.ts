/** Public entry of the Sagwright core: the project contract, the solver, the catalogue, validation. */
export * from './project.ts';
export { solveProject } from './solveProject.ts';
export { WIRE_CATALOG, findCatalogWire, resolveWire, type WireProperties } from './wireCatalog.ts';
export { validateProject, type ValidationIssue, type ValidationResult } from './validateProject.ts';

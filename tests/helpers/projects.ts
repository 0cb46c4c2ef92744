/** Small project builders for core tests (SI; values invented for the tests, not a scenario). */
import type { Load, Project, WeatherCase } from '../../src/core/index.ts';

export interface SpanSpec {
  span: number;
  rise?: number;
  massPerLength: number;
  axialStiffness: number;
  thermalExpansion?: number;
  breakingLoad?: number;
  diameter?: number;
  target: Project['installation']['target'];
  installationTemperature?: number;
  cases?: WeatherCase[];
  loads?: Load[];
  theory?: 'exact' | 'parabolic';
  elementsPerSpan?: number;
  elementOrder?: 1 | 2;
  gravity?: number;
}

export function singleSpan(spec: SpanSpec): Project {
  return {
    format: 'sagwright-project',
    version: 2,
    title: 'test span',
    supports: [
      { x: 0, z: 0 },
      { x: spec.span, z: spec.rise ?? 0 },
    ],
    wire: {
      label: 'test wire',
      diameter: spec.diameter ?? 0.005,
      massPerLength: spec.massPerLength,
      axialStiffness: spec.axialStiffness,
      thermalExpansion: spec.thermalExpansion ?? 0,
      // No wire stretches more than 40 % before it breaks (the validator's rule).
      breakingLoad: spec.breakingLoad ?? Math.min(1e9, 0.4 * spec.axialStiffness),
    },
    loads: spec.loads ?? [],
    installation: {
      temperature: spec.installationTemperature ?? 15,
      withLoads: true,
      target: spec.target,
    },
    cases: spec.cases ?? [],
    limits: { safetyFactor: 5, minClearance: 0 },
    ground: [{ x: 0, z: -1000 }],
    model: {
      theory: spec.theory ?? 'exact',
      elementOrder: spec.elementOrder ?? 1,
      elementsPerSpan: spec.elementsPerSpan ?? 400,
    },
    environment: { gravity: spec.gravity ?? 9.80665 },
  };
}

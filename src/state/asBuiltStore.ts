/**
 * The site measurement for the as-built check (not part of the project document: it describes
 * the wire as installed, not the design). Only a measurement that passed validateAsBuilt is
 * stored; the solver worker answers it with every request while it is set.
 */
import { create } from 'zustand';
import type { AsBuiltMeasurement } from '../core/index.ts';

export interface AsBuiltState {
  measurement: AsBuiltMeasurement | null;
  setMeasurement(measurement: AsBuiltMeasurement | null): void;
}

export function createAsBuiltStore() {
  return create<AsBuiltState>()((set) => ({
    measurement: null,
    setMeasurement: (measurement) => set({ measurement }),
  }));
}

export type AsBuiltStore = ReturnType<typeof createAsBuiltStore>;

export const useAsBuiltStore: AsBuiltStore = createAsBuiltStore();

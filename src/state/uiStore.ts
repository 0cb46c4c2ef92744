/**
 * UI state kept apart from the document: display units and plot options.
 * Persisted on its own key so a reload keeps the person's preferences.
 */
import { create } from 'zustand';
import { createJSONStorage, persist } from 'zustand/middleware';
import type { UnitSystem } from '../core/units.ts';

export const UI_KEY = 'sagwright:ui';

export interface UiState {
  unitSystem: UnitSystem;
  setUnitSystem(unitSystem: UnitSystem): void;
  /** Plot with one metre across equal to one metre up. */
  equalAspect: boolean;
  setEqualAspect(on: boolean): void;
}

export const useUiStore = create<UiState>()(
  persist(
    (set) => ({
      unitSystem: 'si',
      setUnitSystem: (unitSystem) => set({ unitSystem }),
      equalAspect: false,
      setEqualAspect: (equalAspect) => set({ equalAspect }),
    }),
    {
      name: UI_KEY,
      storage: createJSONStorage(() => localStorage),
      partialize: (state) => ({
        unitSystem: state.unitSystem,
        equalAspect: state.equalAspect,
      }),
    },
  ),
);

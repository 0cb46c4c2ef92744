/**
 * Which view of the wire the plot shows (side: height; plan: sideways swing in wind). A plot
 * preference like "True proportions", kept on its own key so a reload keeps it.
 */
import { create } from 'zustand';
import { createJSONStorage, persist } from 'zustand/middleware';
import type { PlotView } from './sagFigure.ts';

export const PLOT_VIEW_KEY = 'sagwright:plot-view';

interface PlotViewState {
  view: PlotView;
  setView(view: PlotView): void;
}

export const usePlotViewStore = create<PlotViewState>()(
  persist(
    (set) => ({
      view: 'side',
      setView: (view) => set({ view }),
    }),
    {
      name: PLOT_VIEW_KEY,
      storage: createJSONStorage(() => localStorage),
      partialize: (state) => ({ view: state.view }),
    },
  ),
);

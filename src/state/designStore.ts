/**
 * The design aids (tension window, wire chooser, today's setting) the worker derived from the
 * document, and the temperature of the day the person typed (UI state, not in the document).
 * The last answers stay while newer ones are worked out; `stale` says they no longer match.
 */
import { create } from 'zustand';
import type { Project } from '../core/index.ts';
import type { DesignAnswers } from '../worker/designAnswers.ts';

export interface DesignState {
  answers: DesignAnswers | null;
  /** The document and temperature the answers are for. */
  answersProject: Project | null;
  answersTemperature: number | null;
  stale: boolean;
  error: string | null;
  /** Temperature of the day, °C, or null when none is entered. */
  temperatureNow: number | null;
  setTemperatureNow(temperature: number | null): void;
  /** The chooser tries every catalogue wire, so it runs only once the person asks for it. */
  chooserOn: boolean;
  setChooserOn(on: boolean): void;
}

export const useDesignStore = create<DesignState>()((set) => ({
  answers: null,
  answersProject: null,
  answersTemperature: null,
  stale: true,
  error: null,
  temperatureNow: null,
  setTemperatureNow: (temperatureNow) => set({ temperatureNow }),
  chooserOn: false,
  setChooserOn: (chooserOn) => set({ chooserOn }),
}));

/**
 * Fields holding typed text that is not (yet) valid, by field id, with the rule it breaks.
 * While any is held the results on screen are marked out of date.
 */
import { create } from 'zustand';

export interface DraftState {
  invalid: Record<string, string>;
  setInvalid(fieldId: string, message: string | null): void;
}

export const useDraftStore = create<DraftState>()((set) => ({
  invalid: {},
  setInvalid(fieldId, message) {
    set((state) => {
      if (message === null) {
        if (!(fieldId in state.invalid)) return state;
        const { [fieldId]: _removed, ...rest } = state.invalid;
        return { invalid: rest };
      }
      if (state.invalid[fieldId] === message) return state;
      return { invalid: { ...state.invalid, [fieldId]: message } };
    });
  },
}));

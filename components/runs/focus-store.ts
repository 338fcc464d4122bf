// The run page's focus view: the list pane hides and the page takes the whole width, so a big
// Khovanov table shows as much as the screen holds. UI state only, never persisted.
import { create } from 'zustand';

export const useRunFocus = create<{ focused: boolean; setFocused: (f: boolean) => void }>((set) => ({
  focused: false,
  setFocused: (focused) => set({ focused }),
}));

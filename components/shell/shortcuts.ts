// Keyboard shortcuts (docs/product.md journey 5): one registry every screen adds to, one key handler
// (ShortcutsHost, web only) that runs them, one sheet (? key) that lists them. A shortcut is a
// key ("n", "/", "?") or a sequence of two ("g s"). To add some to a screen:
//
//   useScreenShortcuts([{ keys: 'n', label: 'New sketch', area: 'Sketches', run: create }]);
//
// They are live while the screen is focused (stacks and tabs keep unfocused screens mounted);
// `registerShortcuts` is the same without the focus rule. When two live shortcuts share keys,
// the one registered last wins, so a screen can take over a global key.
import { useCallback, useMemo, useRef } from 'react';
import type { TextInput } from 'react-native';
import { useFocusEffect } from 'expo-router';
import { create } from 'zustand';

export interface Shortcut {
  /**
   * One key, or two separated by a space ("g f"); letters lower case, as KeyboardEvent.key.
   * "Mod+z" (Ctrl or Cmd with z) is only listed in the sheet: the host never takes Ctrl/Cmd
   * keys, so the screen that lists one handles it itself (the Slate's undo and redo).
   */
  keys: string;
  label: string;
  /** Heading the sheet lists it under, e.g. "Go to", "Feed", "Slate". */
  area: string;
  run: () => void;
}

interface Registry {
  live: Shortcut[][];
  sheetOpen: boolean;
  setSheet: (open: boolean) => void;
}

export const useShortcutRegistry = create<Registry>((set) => ({
  live: [],
  sheetOpen: false,
  setSheet: (sheetOpen) => set({ sheetOpen }),
}));

/** Adds a list of shortcuts; the returned function takes it away again. */
export function registerShortcuts(list: Shortcut[]): () => void {
  useShortcutRegistry.setState((s) => ({ live: [...s.live, list] }));
  return () => useShortcutRegistry.setState((s) => ({ live: s.live.filter((l) => l !== list) }));
}

/** Registers `list` while the calling screen is focused; pass a memoised list. */
export function useScreenShortcuts(list: Shortcut[]): void {
  useFocusEffect(useCallback(() => registerShortcuts(list), [list]));
}

/** "/" focuses the screen's filter field: give the returned ref to its TextInput. */
export function useFilterShortcut(area: string, label: string) {
  const ref = useRef<TextInput>(null);
  const list = useMemo(() => [{ keys: '/', label, area, run: () => ref.current?.focus() }], [area, label]);
  useScreenShortcuts(list);
  return ref;
}

/** Every live shortcut in the order registered, one per key sequence (the last registered wins). */
export function liveShortcuts(live: Shortcut[][]): Shortcut[] {
  const winner = new Map<string, Shortcut>();
  for (const s of live.flat()) winner.set(s.keys, s);
  return live.flat().filter((s) => winner.get(s.keys) === s);
}

export type KeyStep = { kind: 'run'; shortcut: Shortcut } | { kind: 'wait'; prefix: string } | { kind: 'none' };

/**
 * What a key press means after `prefix` (the first key of a sequence, or ''): run a shortcut,
 * wait for the second key, or nothing. A key that ends no sequence after a prefix starts over.
 */
export function step(shortcuts: Shortcut[], prefix: string, key: string): KeyStep {
  const typed = prefix ? `${prefix} ${key}` : key;
  const hit = shortcuts.find((s) => s.keys === typed);
  if (hit) return { kind: 'run', shortcut: hit };
  if (shortcuts.some((s) => s.keys.startsWith(`${typed} `))) return { kind: 'wait', prefix: typed };
  return prefix ? step(shortcuts, '', key) : { kind: 'none' };
}

// The Slate's keyboard shortcuts on the web. Single keys go through the app's shortcut registry
// (components/shell/shortcuts.ts: live while the Slate is focused, listed in the ? sheet);
// the registry leaves Ctrl/Cmd combinations alone (it lists them), so undo and redo have their
// own listener.
// Typing in a field is never taken over.
import { useEffect, useMemo } from 'react';
import { Platform } from 'react-native';
import { deleteComponent } from '@/shared/drawing/sketch';
import { useSlate } from '@/lib/slate/slate-store';
import { useScreenShortcuts, type Shortcut } from '@/components/shell/shortcuts';

const deleteSelected = () => {
  const s = useSlate.getState();
  if (!s.selected) return;
  s.apply({ ...s.history.present, sketch: deleteComponent(s.history.present.sketch, s.selected) });
  s.select(null);
};

/** `enabled` is false while a dialog of the Slate is open: its keys are its own. */
export function useSlateShortcuts(paste: () => void, enabled: boolean) {
  const list = useMemo<Shortcut[]>(() => {
    if (!enabled) return [];
    const s = () => useSlate.getState();
    const slate = (keys: string, label: string, run: () => void): Shortcut => ({ keys, label, area: 'Slate', run });
    return [
      slate('d', 'Draw', () => s().setTool('draw')),
      slate('f', 'Flip crossings', () => s().setTool('flip')),
      slate('m', 'Move a component', () => s().setTool('move')),
      slate('r', 'Reshape a strand', () => s().setTool('reshape')),
      slate('b', 'Draw bands', () => s().setTool('bands')),
      slate('Delete', 'Delete the selected component', deleteSelected),
      slate('Backspace', 'The same as Delete', deleteSelected),
      slate('Escape', 'Clear the selection', () => s().select(null)),
      slate('0', 'Fit the drawing to the Slate', () => s().fit()),
      slate('p', 'Paste a code', paste),
      // Listed only (Ctrl/Cmd keys): the listener below runs them.
      slate('Mod+z', 'Undo', () => s().undo()),
      slate('Mod+Shift+z', 'Redo', () => s().redo()),
      slate('Mod+y', 'Redo', () => s().redo()),
    ];
  }, [enabled, paste]);
  useScreenShortcuts(list);

  useEffect(() => {
    if (!enabled || Platform.OS !== 'web' || typeof window === 'undefined') return;
    const onKey = (e: KeyboardEvent) => {
      const t = e.target as HTMLElement | null;
      if (t && (t.tagName === 'INPUT' || t.tagName === 'TEXTAREA' || t.isContentEditable)) return;
      if (!(e.ctrlKey || e.metaKey) || e.altKey) return;
      const key = e.key.toLowerCase();
      const s = useSlate.getState();
      if (key === 'z') (e.shiftKey ? s.redo : s.undo)();
      else if (key === 'y') s.redo();
      else return;
      e.preventDefault();
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [enabled]);
}

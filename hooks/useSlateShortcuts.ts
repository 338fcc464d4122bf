// Keyboard shortcuts of the Slate on the web (wide screens with a keyboard). Typing in a field
// is never taken over.
import { useEffect } from 'react';
import { Platform } from 'react-native';
import { deleteComponent } from '@/shared/drawing/sketch';
import { useSlate } from '@/lib/slate/slate-store';

export const shortcutList: readonly [string, string][] = [
  ['Ctrl Z', 'Undo'],
  ['Ctrl Shift Z / Ctrl Y', 'Redo'],
  ['D', 'Draw'],
  ['F', 'Flip crossings'],
  ['M', 'Move a component'],
  ['R', 'Reshape a strand'],
  ['Delete', 'Delete the selected component'],
  ['Esc', 'Clear the selection'],
  ['0', 'Fit the drawing to the Slate'],
  ['P', 'Paste a code'],
  ['?', 'Show this list'],
];

/** `enabled` is false while a dialog is open: its keys are its own (Escape closes it). */
export function useSlateShortcuts(on: { help: () => void; paste: () => void }, enabled: boolean) {
  useEffect(() => {
    if (!enabled || Platform.OS !== 'web' || typeof window === 'undefined') return;
    const onKey = (e: KeyboardEvent) => {
      const t = e.target as HTMLElement | null;
      if (t && (t.tagName === 'INPUT' || t.tagName === 'TEXTAREA' || t.isContentEditable)) return;
      const s = useSlate.getState();
      const mod = e.ctrlKey || e.metaKey;
      const key = e.key.toLowerCase();
      let handled = true;
      if (mod && key === 'z') (e.shiftKey ? s.redo : s.undo)();
      else if (mod && key === 'y') s.redo();
      else if (mod || e.altKey) handled = false;
      else if (key === 'd') s.setTool('draw');
      else if (key === 'f') s.setTool('flip');
      else if (key === 'm') s.setTool('move');
      else if (key === 'r') s.setTool('reshape');
      else if (key === '0') s.fit();
      else if (key === 'p') on.paste();
      else if (e.key === '?') on.help();
      else if (e.key === 'Escape') s.select(null);
      else if ((e.key === 'Delete' || e.key === 'Backspace') && s.selected) {
        const doc = s.history.present;
        s.apply({ ...doc, sketch: deleteComponent(doc.sketch, s.selected) });
        s.select(null);
      } else handled = false;
      if (handled) e.preventDefault();
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [on, enabled]);
}

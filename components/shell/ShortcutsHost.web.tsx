// The web's key handler for the shortcut registry (shortcuts.ts), the app-wide shortcuts (g then
// the first letter of a destination, ? for the sheet) and the sheet itself. Typing in a field
// and keys with Ctrl, Cmd or Alt are never taken. A single key waits until every other handler
// has seen it and runs only if none took it (the Slate's own keys come first); the second key of
// a sequence is taken before anyone else sees it, so "g f" never also picks the Slate's flip tool.
// Native builds use ShortcutsHost.tsx (nothing).
import { useEffect, useMemo } from 'react';
import { useRouter } from 'expo-router';
import { destinations } from './destinations';
import { ShortcutSheet } from './ShortcutSheet';
import { liveShortcuts, registerShortcuts, step, useShortcutRegistry, type Shortcut } from './shortcuts';

/** How long the first key of a sequence waits for the second. */
const SEQUENCE_MS = 1500;

const typing = (t: EventTarget | null) => {
  const el = t as HTMLElement | null;
  return !!el && (el.tagName === 'INPUT' || el.tagName === 'TEXTAREA' || el.tagName === 'SELECT' || el.isContentEditable);
};
const keyOf = (e: KeyboardEvent) => (e.key.length === 1 ? e.key.toLowerCase() : e.key);

export function ShortcutsHost() {
  const router = useRouter();
  const sheetOpen = useShortcutRegistry((s) => s.sheetOpen);
  const setSheet = useShortcutRegistry((s) => s.setSheet);
  const global = useMemo<Shortcut[]>(
    () => [
      ...destinations.map((d) => ({ keys: `g ${d.name[0]}`, label: d.label, area: 'Go to', run: () => router.navigate(`/${d.name}`) })),
      { keys: '?', label: 'Show or hide this list', area: 'Help', run: () => setSheet(!useShortcutRegistry.getState().sheetOpen) },
    ],
    [router, setSheet],
  );
  useEffect(() => registerShortcuts(global), [global]);

  useEffect(() => {
    let prefix = '';
    let timer: ReturnType<typeof setTimeout> | undefined;
    const live = () => liveShortcuts(useShortcutRegistry.getState().live);
    const ignored = (e: KeyboardEvent) => e.ctrlKey || e.metaKey || e.altKey || typing(e.target);
    const onCapture = (e: KeyboardEvent) => {
      if (!prefix || ignored(e)) return;
      const r = step(live(), prefix, keyOf(e));
      prefix = '';
      if (r.kind !== 'run' || !r.shortcut.keys.includes(' ')) return; // not a sequence's end: handled as a single key
      e.preventDefault();
      e.stopImmediatePropagation();
      r.shortcut.run();
    };
    const onKey = (e: KeyboardEvent) => {
      if (ignored(e)) return;
      if (e.key === 'Escape' && useShortcutRegistry.getState().sheetOpen) {
        setSheet(false);
        return;
      }
      const r = step(live(), '', keyOf(e));
      // A sequence waits at once (its second key may come before the check below); the check
      // drops it again when another handler took the first key.
      if (r.kind === 'wait') {
        prefix = r.prefix;
        clearTimeout(timer);
        timer = setTimeout(() => { prefix = ''; }, SEQUENCE_MS);
      }
      setTimeout(() => {
        if (!e.defaultPrevented) {
          if (r.kind === 'run') r.shortcut.run();
        } else if (r.kind === 'wait' && prefix === r.prefix) prefix = '';
      }, 0);
    };
    window.addEventListener('keydown', onCapture, true);
    window.addEventListener('keydown', onKey);
    return () => {
      clearTimeout(timer);
      window.removeEventListener('keydown', onCapture, true);
      window.removeEventListener('keydown', onKey);
    };
  }, [setSheet]);

  return sheetOpen ? <ShortcutSheet onClose={() => setSheet(false)} /> : null;
}

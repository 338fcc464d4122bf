// Native: no hardware keyboard handling (the web sibling runs the shortcuts).
export function ShortcutsHost() {
  return null;
}

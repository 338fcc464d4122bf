// The keyboard shortcut registry (components/shell/shortcuts.ts): sequences, single keys, the
// last registered list winning, unregistering; the sheet's names for Ctrl/Cmd keys.
import { render, screen } from '@testing-library/react-native';
import { liveShortcuts, registerShortcuts, step, useShortcutRegistry, type Shortcut } from '@/components/shell/shortcuts';
import { ShortcutSheet } from '@/components/shell/ShortcutSheet';

const sc = (keys: string, label = keys): Shortcut => ({ keys, label, area: 'Test', run: jest.fn() });

describe('step', () => {
  const list = [sc('g s'), sc('g f'), sc('/'), sc('?')];

  it('runs a single key, waits after the first key of a sequence, runs its second', () => {
    expect(step(list, '', '/')).toEqual({ kind: 'run', shortcut: list[2] });
    expect(step(list, '', 'g')).toEqual({ kind: 'wait', prefix: 'g' });
    expect(step(list, 'g', 'f')).toEqual({ kind: 'run', shortcut: list[1] });
  });

  it('starts over when the second key ends no sequence, and ignores unknown keys', () => {
    expect(step(list, 'g', '?')).toEqual({ kind: 'run', shortcut: list[3] });
    expect(step(list, 'g', 'x')).toEqual({ kind: 'none' });
    expect(step(list, '', 's')).toEqual({ kind: 'none' });
  });
});

describe('the registry', () => {
  afterEach(() => useShortcutRegistry.setState({ live: [] }));

  it('lists every live shortcut once, the list registered last winning a shared key', () => {
    const global = [sc('g s', 'Sketches'), sc('/', 'Filter (global)')];
    const screen = [sc('/', 'Filter by tag')];
    registerShortcuts(global);
    const off = registerShortcuts(screen);
    const live = liveShortcuts(useShortcutRegistry.getState().live);
    expect(live.map((s) => s.label).sort()).toEqual(['Filter by tag', 'Sketches']);
    off();
    expect(liveShortcuts(useShortcutRegistry.getState().live).map((s) => s.label).sort()).toEqual(['Filter (global)', 'Sketches']);
  });
});

describe('Ctrl/Cmd keys', () => {
  afterEach(() => useShortcutRegistry.setState({ live: [] }));

  it('are listed in the sheet as Ctrl/Cmd+... but never run by the host', () => {
    const list = [sc('Mod+z', 'Undo'), sc('Mod+Shift+z', 'Redo'), sc('z', 'Zoom')];
    registerShortcuts(list);
    render(<ShortcutSheet onClose={() => undefined} />);
    expect(screen.getByText('Ctrl/Cmd+Z')).toBeTruthy();
    expect(screen.getByText('Ctrl/Cmd+Shift+Z')).toBeTruthy();
    expect(screen.getByText('Undo')).toBeTruthy();
    // A plain z is its own key; the host meets Ctrl/Cmd+Z never (it skips modified keys).
    expect(step(list, '', 'z')).toEqual({ kind: 'run', shortcut: list[2] });
  });
});

// The Slate's single-key tools, as the ? sheet lists them: every tool of the toolbar has its key,
// Bands too.
import { render } from '@testing-library/react-native';
import { liveShortcuts, useShortcutRegistry } from '@/components/shell/shortcuts';
import { useSlateShortcuts } from '@/hooks/useSlateShortcuts';
import { useSlate } from '@/lib/slate/slate-store';

jest.mock('expo-router', () => ({ useFocusEffect: (effect: () => () => void) => jest.requireActual('react').useEffect(effect, [effect]) }));

function Slate() {
  useSlateShortcuts(() => undefined, true);
  return null;
}

test('d, f, m, r and b choose Draw, Flip, Move, Reshape and Bands', () => {
  render(<Slate />);
  const live = liveShortcuts(useShortcutRegistry.getState().live);
  const press = (key: string) => live.find((s) => s.keys === key)!.run();
  for (const [key, tool] of [['b', 'bands'], ['m', 'move'], ['f', 'flip'], ['r', 'reshape'], ['d', 'draw']] as const) {
    press(key);
    expect(useSlate.getState().tool).toBe(tool);
  }
  expect(live.find((s) => s.keys === 'b')?.label).toBe('Draw bands');
});

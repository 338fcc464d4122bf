// The Readout's copy buttons say what happened: "Copied" only when the clipboard took the text,
// otherwise that the browser refused it (a page over plain http, or no permission).
import { act, renderHook } from '@testing-library/react-native';
import * as Clipboard from 'expo-clipboard';
import { analyse } from '@/shared/drawing/analyse';
import { emptyDoc } from '@/lib/slate/record';
import type { LocalSketch } from '@/lib/store/types';
import { useSlateActions } from '@/hooks/useSlateActions';

jest.mock('expo-clipboard', () => ({ setStringAsync: jest.fn() }));
jest.mock('expo-router', () => ({ router: { push: jest.fn() } }));

const setString = Clipboard.setStringAsync as jest.Mock;
const sketch = { id: 's1', title: '' } as LocalSketch;

function copyWith(answer: () => Promise<boolean>) {
  setString.mockImplementation(answer);
  const { result } = renderHook(() => useSlateActions(sketch, emptyDoc, analyse(emptyDoc.sketch), () => {}));
  return result;
}

// Any text does; this is the trefoil's PD code of docs/conventions.md (from memory), as in share.spec.ts.
test('a clipboard that takes the text: "Copied the PD code."', async () => {
  const result = copyWith(() => Promise.resolve(true));
  await act(() => result.current.copy('[[1,5,2,4],[3,1,4,6],[5,3,6,2]]', 'PD code'));
  expect(setString).toHaveBeenCalledWith('[[1,5,2,4],[3,1,4,6],[5,3,6,2]]');
  expect(result.current.message).toBe('Copied the PD code.');
});

test('a clipboard that answers false or throws: the message says it was refused, never "Copied"', async () => {
  for (const answer of [() => Promise.resolve(false), () => Promise.reject(new Error('NotAllowedError'))]) {
    const result = copyWith(answer);
    await act(() => result.current.copy('1 1 1', 'braid word'));
    expect(result.current.message).toBe('Could not copy the braid word: this browser refused the clipboard.');
  }
});

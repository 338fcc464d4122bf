import { useWindowDimensions } from 'react-native';
import { WIDE_BREAKPOINT } from '@/constants/theme';

/** Phone layout (bottom tabs, one pane) below the breakpoint; side rail and split panes above. */
export function useIsWide(): boolean {
  return useWindowDimensions().width >= WIDE_BREAKPOINT;
}

// The Jones polynomial of a feed item, typeset (KaTeX on web), from the summary the server sends;
// a line saying so while the server is still computing it.
import { StyleSheet, Text } from 'react-native';
import { colors, type } from '@/constants/theme';
import { TeX } from '@/components/ui/Math';
import type { InvariantSummary } from '@/shared/api/feed';
import { Laurent } from '@/shared/poly/laurent';

export function Jones({ inv, lhs = 'V' }: { inv: InvariantSummary; lhs?: string }) {
  if (inv.computing) return <Text style={styles.muted}>Jones polynomial: computing…</Text>;
  if (!inv.jones) return null;
  const v = Laurent.fromJSON(inv.jones);
  return <TeX tex={`${lhs} = ${v.format('t', 'latex')}`} text={`${lhs} = ${inv.jonesText ?? v.format('t', 'unicode')}`} />;
}

const styles = StyleSheet.create({ muted: { ...type.small, color: colors.inkMuted } });

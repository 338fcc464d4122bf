import { ScrollView, StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import { COLUMN_MAX, colors, space } from '@/constants/theme';

/** A scrolling page on paper with one readable column; `wide` lets lists use more width, 'full' all of it. */
export function Screen({ children, wide = false }: { children: React.ReactNode; wide?: boolean | 'full' }) {
  const insets = useSafeAreaInsets();
  return (
    <ScrollView
      style={styles.scroll}
      contentContainerStyle={[styles.content, { paddingTop: insets.top + space.xl }]}
      keyboardShouldPersistTaps="handled"
    >
      <View style={[styles.column, { maxWidth: wide === 'full' ? undefined : wide ? 880 : COLUMN_MAX }]}>{children}</View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flex: 1, backgroundColor: colors.paper },
  content: { flexGrow: 1, paddingHorizontal: space.lg + 4, paddingBottom: space.xxxl },
  column: { width: '100%', alignSelf: 'center', gap: space.xl },
});

// The calm page around sign-in, sign-up, sign-out and invitations: the mark, a title, one column.
import { ScrollView, StyleSheet, Text, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import { Mark } from '@/components/shell/icons';
import { colors, fonts, radius, space, type } from '@/constants/theme';

export function AuthFrame({ title, lead, children }: { title: string; lead?: string; children: React.ReactNode }) {
  const insets = useSafeAreaInsets();
  return (
    <ScrollView style={styles.scroll} contentContainerStyle={[styles.content, { paddingTop: insets.top + space.xxl }]}
      keyboardShouldPersistTaps="handled">
      <View style={styles.column}>
        <View style={styles.brand}>
          <Mark size={40} />
          <Text style={styles.brandText}>Overstrand</Text>
        </View>
        <View style={styles.head}>
          <Text role="heading" aria-level={1} style={styles.title}>{title}</Text>
          {lead ? <Text style={styles.lead}>{lead}</Text> : null}
        </View>
        <View style={styles.card}>{children}</View>
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flex: 1, backgroundColor: colors.paper },
  content: { flexGrow: 1, paddingHorizontal: space.lg + 4, paddingBottom: space.xxxl },
  column: { width: '100%', maxWidth: 440, alignSelf: 'center', gap: space.xl },
  brand: { flexDirection: 'row', alignItems: 'center', gap: space.sm + 2 },
  brandText: { fontFamily: fonts.semibold, fontSize: 19, color: colors.ink, letterSpacing: -0.2 },
  head: { gap: space.sm, marginTop: space.lg },
  title: { ...type.display, color: colors.ink },
  lead: { ...type.body, color: colors.inkMuted },
  card: { backgroundColor: colors.surface, borderRadius: radius.lg, borderWidth: 1, borderColor: colors.line, padding: space.xl, gap: space.lg },
});

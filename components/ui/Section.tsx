import { StyleSheet, Text, View } from 'react-native';
import { colors, radius, space, type } from '@/constants/theme';

/** A titled block on a white card: the unit every settings-like page is built from. */
export function Section({ title, note, children }: { title: string; note?: React.ReactNode; children: React.ReactNode }) {
  return (
    <View style={styles.section}>
      <View style={styles.head}>
        <Text role="heading" aria-level={2} style={styles.title}>
          {title}
        </Text>
        {note ? <Text style={styles.note}>{note}</Text> : null}
      </View>
      <View style={styles.card}>{children}</View>
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.sm },
  head: { gap: 2, paddingHorizontal: 2 },
  title: { ...type.caps, color: colors.inkMuted },
  note: { ...type.small, color: colors.inkMuted },
  card: {
    backgroundColor: colors.surface,
    borderRadius: radius.lg,
    borderWidth: 1,
    borderColor: colors.line,
    padding: space.lg,
    gap: space.lg,
  },
});

import { StyleSheet, Text, View } from 'react-native';
import type { Role } from '@/shared/api/groups';
import { colors, radius, space, type } from '@/constants/theme';

/** A role as a small pill; the row wrapper keeps it content-wide in columns and centred in rows. */
export function RoleBadge({ role }: { role: Role }) {
  const strong = role === 'owner' || role === 'admin';
  return (
    <View style={styles.wrap}>
      <View style={[styles.badge, strong ? styles.strong : styles.plain]}>
        <Text style={[styles.text, { color: strong ? colors.accent : colors.inkMuted }]}>{role}</Text>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { flexDirection: 'row' },
  badge: { borderRadius: radius.pill, paddingHorizontal: space.sm + 2, paddingVertical: 2 },
  strong: { backgroundColor: colors.accentSoft },
  plain: { backgroundColor: colors.sunken },
  text: { ...type.caps, fontSize: 11 },
});

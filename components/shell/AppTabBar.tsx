// The tab bar for app/(tabs): a bottom bar on phones (thumb reach), a side rail on wide screens.
import { Platform, Pressable, StyleSheet, Text, View } from 'react-native';
import type { BottomTabBarProps } from 'expo-router/js-tabs';
import { colors, fonts, radius, space, type } from '@/constants/theme';
import { useSession } from '@/hooks/useSession';
import { destinations } from './destinations';
import type { PressState } from '@/components/ui/press-state';
import { Mark } from './icons';
import { useShortcutRegistry } from './shortcuts';

export function AppTabBar({ state, navigation, insets, wide }: BottomTabBarProps & { wide: boolean }) {
  const user = useSession((s) => s.user);
  const setSheet = useShortcutRegistry((s) => s.setSheet);
  const current = state.routes[state.index]?.name;

  const items = destinations.map(({ name, label, Icon }) => {
    const route = state.routes.find((r) => r.name === name);
    const focused = current === name;
    const color = focused ? colors.accent : colors.inkMuted;
    const onPress = () => {
      if (!route) return;
      const event = navigation.emit({ type: 'tabPress', target: route.key, canPreventDefault: true });
      if (!focused && !event.defaultPrevented) navigation.navigate(route.name);
    };
    return (
      <Pressable
        key={name}
        role="tab"
        aria-selected={focused}
        aria-label={label}
        testID={`tab-${name}`}
        onPress={onPress}
        style={({ hovered }: PressState) => [
          wide ? styles.railItem : styles.barItem,
          focused && (wide ? styles.railItemOn : styles.barItemOn),
          hovered && !focused && wide && styles.railItemHover,
        ]}
      >
        <Icon color={color} size={wide ? 22 : 24} />
        <Text style={[wide ? styles.railLabel : styles.barLabel, { color }, focused && styles.labelOn]}>{label}</Text>
      </Pressable>
    );
  });

  if (!wide) {
    return (
      <View role="tablist" style={[styles.bar, { paddingBottom: Math.max(insets.bottom, space.xs) }]}>
        {items}
      </View>
    );
  }
  return (
    <View role="tablist" style={[styles.rail, { paddingTop: insets.top + space.xl }]}>
      <View style={styles.brand}>
        <Mark size={34} />
        <Text style={styles.brandText}>Overstrand</Text>
      </View>
      <View style={styles.railItems}>{items}</View>
      {Platform.OS === 'web' ? (
        <Pressable role="button" onPress={() => setSheet(true)} style={({ hovered }: PressState) => [styles.keysHint, hovered && styles.railItemHover]}>
          <Text style={styles.keysHintText}>Keyboard shortcuts</Text>
          <Text style={styles.keyCap}>?</Text>
        </Pressable>
      ) : null}
      {user ? (
        <View style={styles.who}>
          <Text style={styles.whoName} numberOfLines={1}>{user.displayName}</Text>
          <Text style={styles.whoMail} numberOfLines={1}>{user.email}</Text>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  bar: {
    flexDirection: 'row',
    backgroundColor: colors.surface,
    borderTopWidth: 1,
    borderTopColor: colors.line,
    paddingTop: space.xs,
  },
  barItem: { flex: 1, alignItems: 'center', justifyContent: 'center', minHeight: 56, gap: 3, borderRadius: radius.md },
  barItemOn: {},
  barLabel: { ...type.label, fontSize: 12, lineHeight: 16 },
  labelOn: { fontFamily: fonts.semibold },
  rail: {
    width: 232,
    backgroundColor: colors.surface,
    borderRightWidth: 1,
    borderRightColor: colors.line,
    paddingHorizontal: space.md,
    paddingBottom: space.xl,
  },
  brand: { flexDirection: 'row', alignItems: 'center', gap: space.sm + 2, paddingHorizontal: space.md, marginBottom: space.xxl },
  brandText: { fontFamily: fonts.semibold, fontSize: 19, color: colors.ink, letterSpacing: -0.2 },
  railItems: { gap: 2, flex: 1 },
  railItem: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.md,
    minHeight: 44,
    paddingHorizontal: space.md,
    borderRadius: radius.md,
  },
  railItemOn: { backgroundColor: colors.accentSoft },
  keysHint: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', minHeight: 36, paddingHorizontal: space.md, borderRadius: radius.md, marginBottom: space.sm },
  keysHintText: { ...type.small, color: colors.inkMuted },
  keyCap: { fontFamily: fonts.monoMedium, fontSize: 12, color: colors.inkMuted, backgroundColor: colors.sunken, borderRadius: radius.sm, paddingHorizontal: 6, paddingVertical: 1 },
  railItemHover: { backgroundColor: colors.paper },
  railLabel: { ...type.body, fontFamily: fonts.medium },
  who: { paddingHorizontal: space.md, paddingTop: space.lg, borderTopWidth: 1, borderTopColor: colors.line, gap: 2 },
  whoName: { ...type.label, color: colors.ink },
  whoMail: { ...type.small, fontSize: 13, color: colors.inkMuted },
});

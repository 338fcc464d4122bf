// The list of keyboard shortcuts live on this screen, by area (the ? key opens and closes it).
import { Modal, Pressable, ScrollView, StyleSheet, Text, View } from 'react-native';
import { colors, fonts, radius, space, type } from '@/constants/theme';
import { liveShortcuts, useShortcutRegistry } from './shortcuts';

const keyName = (k: string): string =>
  k.startsWith('Mod+') ? `Ctrl/Cmd+${k.slice(4).split('+').map(keyName).join('+')}` : k === ' ' ? 'Space' : k.length === 1 ? k.toUpperCase() : k;

export function ShortcutSheet({ onClose }: { onClose: () => void }) {
  const live = useShortcutRegistry((s) => s.live);
  const areas = new Map<string, ReturnType<typeof liveShortcuts>>();
  for (const s of liveShortcuts(live)) areas.set(s.area, [...(areas.get(s.area) ?? []), s]);
  return (
    <Modal transparent visible animationType="fade" onRequestClose={onClose}>
      <View style={styles.scrim}>
        <Pressable style={StyleSheet.absoluteFill} onPress={onClose} accessibilityLabel="Close" />
        <View style={styles.card} role="dialog" aria-label="Keyboard shortcuts">
          <View style={styles.head}>
            <Text role="heading" aria-level={2} style={styles.title}>Keyboard shortcuts</Text>
            <Pressable role="button" accessibilityLabel="Close" onPress={onClose} style={styles.close}>
              <Text style={styles.closeText}>×</Text>
            </Pressable>
          </View>
          <ScrollView contentContainerStyle={styles.body}>
            {[...areas].map(([area, list]) => (
              <View key={area} style={styles.area}>
                <Text style={styles.areaTitle}>{area}</Text>
                {list.map((s) => (
                  <View key={s.keys} style={styles.row}>
                    <View style={styles.keys}>
                      {s.keys.split(' ').map((k, i) => (
                        <Text key={i} style={i ? styles.then : undefined}>
                          {i ? 'then ' : ''}<Text style={styles.key}>{keyName(k)}</Text>
                        </Text>
                      ))}
                    </View>
                    <Text style={styles.label}>{s.label}</Text>
                  </View>
                ))}
              </View>
            ))}
            <Text style={styles.note}>Keys are not taken while you type in a field. Esc closes this list.</Text>
          </ScrollView>
        </View>
      </View>
    </Modal>
  );
}

const styles = StyleSheet.create({
  scrim: { flex: 1, alignItems: 'center', justifyContent: 'center', padding: space.lg, backgroundColor: colors.scrim },
  card: { width: '100%', maxWidth: 440, maxHeight: '90%', borderRadius: radius.lg, backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line },
  head: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', paddingHorizontal: space.lg, paddingTop: space.lg },
  title: { ...type.heading, color: colors.ink },
  close: { width: 36, height: 36, alignItems: 'center', justifyContent: 'center', borderRadius: radius.pill },
  closeText: { fontSize: 22, color: colors.inkMuted },
  body: { padding: space.lg, gap: space.lg },
  area: { gap: space.sm },
  areaTitle: { ...type.caps, color: colors.inkMuted },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  keys: { flexDirection: 'row', alignItems: 'center', gap: space.xs, minWidth: 120 },
  key: { fontFamily: fonts.monoMedium, fontSize: 13, color: colors.ink, backgroundColor: colors.sunken, borderRadius: radius.sm, paddingHorizontal: 6, paddingVertical: 2 },
  then: { ...type.small, color: colors.inkFaint },
  label: { ...type.body, color: colors.ink, flex: 1 },
  note: { ...type.small, color: colors.inkMuted },
});

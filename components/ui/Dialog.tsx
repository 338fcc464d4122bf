// A centred card over a dimmed screen (Modal): the paste, families, framing, details and conventions sheets.
import { useEffect } from 'react';
import { Modal, Platform, Pressable, ScrollView, StyleSheet, Text, View } from 'react-native';
import { colors, radius, shadows, space, type } from '@/constants/theme';

export function Dialog({ title, visible, onClose, children, actions, wide = false }: {
  title: string;
  visible: boolean;
  onClose: () => void;
  children: React.ReactNode;
  /** Buttons kept in view under the content, which scrolls on a short screen. */
  actions?: React.ReactNode;
  wide?: boolean;
}) {
  // Web: Escape closes (react-native-web's Modal does not listen for it).
  useEffect(() => {
    if (!visible || Platform.OS !== 'web' || typeof window === 'undefined') return;
    const onKey = (e: KeyboardEvent) => e.key === 'Escape' && onClose();
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [visible, onClose]);
  return (
    <Modal transparent visible={visible} animationType="fade" onRequestClose={onClose}>
      <View style={styles.scrim}>
        <Pressable style={StyleSheet.absoluteFill} onPress={onClose} accessibilityLabel="Close" />
        <View style={[styles.card, { maxWidth: wide ? 640 : 480 }]} role="dialog" aria-label={title}>
          <View style={styles.head}>
            <Text role="heading" aria-level={2} style={styles.title}>{title}</Text>
            <Pressable role="button" accessibilityLabel="Close" onPress={onClose} style={styles.close}>
              <Text style={styles.closeText}>×</Text>
            </Pressable>
          </View>
          <ScrollView contentContainerStyle={styles.body} keyboardShouldPersistTaps="handled">{children}</ScrollView>
          {actions ? <View style={styles.actions}>{actions}</View> : null}
        </View>
      </View>
    </Modal>
  );
}

const styles = StyleSheet.create({
  scrim: { flex: 1, backgroundColor: colors.scrim, alignItems: 'center', justifyContent: 'center', paddingHorizontal: space.lg, paddingVertical: 64 },
  card: { width: '100%', maxHeight: '100%', backgroundColor: colors.surface, borderRadius: radius.lg, overflow: 'hidden', boxShadow: shadows.card } as object,
  head: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', paddingLeft: space.xl, paddingRight: space.sm, paddingTop: space.md, borderBottomWidth: 1, borderBottomColor: colors.line, paddingBottom: space.sm },
  title: { ...type.title, color: colors.ink },
  close: { width: 44, height: 44, alignItems: 'center', justifyContent: 'center' },
  closeText: { fontSize: 26, color: colors.inkMuted },
  body: { padding: space.xl, gap: space.lg },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, paddingHorizontal: space.xl, paddingVertical: space.md, borderTopWidth: 1, borderTopColor: colors.line },
});

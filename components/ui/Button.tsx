import { ActivityIndicator, Pressable, StyleSheet, Text, View } from 'react-native';
import { TOUCH, colors, radius, space, type } from '@/constants/theme';
import type { PressState } from '@/components/ui/press-state';

type Variant = 'primary' | 'secondary' | 'quiet' | 'danger';

type Props = {
  label: string;
  onPress?: () => void;
  variant?: Variant;
  /** Shows a spinner, keeps the width and refuses presses (a submit in flight). */
  busy?: boolean;
  busyLabel?: string;
  disabled?: boolean;
  testID?: string;
};

export function Button({ label, onPress, variant = 'primary', busy = false, busyLabel, disabled = false, testID }: Props) {
  const inactive = disabled || busy;
  const tone = tones[variant];
  return (
    <Pressable
      role="button"
      testID={testID}
      accessibilityLabel={busy ? busyLabel ?? label : label}
      aria-disabled={inactive}
      aria-busy={busy}
      disabled={inactive}
      onPress={onPress}
      style={({ pressed, hovered }: PressState) => [
        styles.base,
        { backgroundColor: tone.bg, borderColor: tone.border },
        (pressed || hovered) && !inactive && { backgroundColor: tone.pressed },
        inactive && !busy && styles.disabled,
      ]}
    >
      <View style={styles.row}>
        {busy && <ActivityIndicator size="small" color={tone.fg} />}
        <Text style={[styles.label, { color: tone.fg }]}>{busy ? busyLabel ?? label : label}</Text>
      </View>
    </Pressable>
  );
}

const tones: Record<Variant, { bg: string; fg: string; border: string; pressed: string }> = {
  primary: { bg: colors.accent, fg: colors.onAccent, border: colors.accent, pressed: colors.accentPressed },
  secondary: { bg: colors.surface, fg: colors.accent, border: colors.line, pressed: colors.accentSoft },
  quiet: { bg: 'transparent', fg: colors.accent, border: 'transparent', pressed: colors.accentSoft },
  danger: { bg: colors.surface, fg: colors.danger, border: colors.line, pressed: colors.dangerSoft },
};

const styles = StyleSheet.create({
  base: {
    minHeight: TOUCH,
    paddingHorizontal: space.xl,
    borderRadius: radius.md,
    borderWidth: 1,
    alignItems: 'center',
    justifyContent: 'center',
    // A long label (a group's full name) wraps inside its box instead of running out of a dialog.
    maxWidth: '100%',
    paddingVertical: space.xs,
  },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexShrink: 1 },
  label: { ...type.heading, flexShrink: 1, textAlign: 'center' },
  disabled: { opacity: 0.45 },
});

// A plain labelled text input (the Slate's dialogs hold their own state, no form library).
import { StyleSheet, Text, TextInput, View, type TextInputProps } from 'react-native';
import { TOUCH, colors, fonts, radius, space, type } from '@/constants/theme';

export function Field({ label, hint, mono, error, ...input }: TextInputProps & { label: string; hint?: string; mono?: boolean; error?: string | null }) {
  return (
    <View style={styles.wrap}>
      <Text style={styles.label}>{label}</Text>
      <TextInput
        {...input}
        aria-label={label}
        aria-invalid={!!error}
        placeholderTextColor={colors.inkFaint}
        style={[styles.input, mono && { fontFamily: fonts.mono, fontSize: 14 }, input.multiline && styles.multi, !!error && styles.invalid]}
      />
      {error ? <Text role="alert" style={styles.error}>{error}</Text> : hint ? <Text style={styles.hint}>{hint}</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs + 2 },
  label: { ...type.label, color: colors.ink },
  input: { ...type.body, minHeight: TOUCH, paddingHorizontal: space.md, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface, color: colors.ink, outlineStyle: 'none' } as object,
  multi: { minHeight: 96, paddingVertical: space.sm, textAlignVertical: 'top' } as object,
  invalid: { borderColor: colors.danger },
  error: { ...type.small, color: colors.danger },
  hint: { ...type.small, color: colors.inkMuted },
});

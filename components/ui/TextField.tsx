import { useState } from 'react';
import { StyleSheet, Text, TextInput, View, type TextInputProps } from 'react-native';
import { Controller, type Control, type FieldValues, type Path } from 'react-hook-form';
import { TOUCH, colors, fonts, radius, space, type } from '@/constants/theme';

type FieldProps<T extends FieldValues> = Omit<TextInputProps, 'value' | 'onChangeText' | 'onBlur'> & {
  control: Control<T>;
  name: Path<T>;
  label: string;
  hint?: string;
  mono?: boolean;
};

/** A labelled text input bound to react-hook-form; its validation error shows inline under it. */
export function TextField<T extends FieldValues>({ control, name, label, hint, mono, ...input }: FieldProps<T>) {
  const [focused, setFocused] = useState(false);
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => {
        const error = fieldState.error?.message;
        const id = `field-${String(name)}`;
        return (
          <View style={styles.wrap}>
            <Text nativeID={`${id}-label`} style={styles.label}>
              {label}
            </Text>
            <TextInput
              {...input}
              ref={field.ref}
              value={field.value ?? ''}
              onChangeText={field.onChange}
              onFocus={() => setFocused(true)}
              onBlur={() => {
                setFocused(false);
                field.onBlur();
              }}
              aria-label={label}
              aria-invalid={!!error}
              placeholderTextColor={colors.inkFaint}
              style={[
                styles.input,
                mono && { fontFamily: fonts.mono },
                focused && styles.focused,
                !!error && styles.invalid,
              ]}
            />
            {error ? (
              <Text role="alert" style={styles.error}>
                {error}
              </Text>
            ) : hint ? (
              <Text style={styles.hint}>{hint}</Text>
            ) : null}
          </View>
        );
      }}
    />
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs + 2 },
  label: { ...type.label, color: colors.ink },
  input: {
    ...type.body,
    minHeight: TOUCH,
    paddingHorizontal: space.md + 2,
    borderRadius: radius.md,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.surface,
    color: colors.ink,
    outlineStyle: 'none',
  } as object,
  focused: { borderColor: colors.accent, boxShadow: `0 0 0 3px ${colors.accentSoft}` } as object,
  invalid: { borderColor: colors.danger },
  error: { ...type.small, color: colors.danger },
  hint: { ...type.small, color: colors.inkMuted },
});

// A segmented choice of a few options (radio semantics), used by dialogs and forms.
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { TeX } from '@/components/ui/Math';
import { TOUCH, colors, radius, shadows, space, type } from '@/constants/theme';

export function Choice<T extends string>({ label, options, value, onChange }: {
  label: string;
  /** `tex`: the label typeset (a ring, ℤ); `label` stays its accessible name and native text. */
  options: readonly { value: T; label: string; tex?: string }[];
  value: T;
  onChange: (v: T) => void;
}) {
  return (
    <View role="radiogroup" aria-label={label} style={styles.choice}>
      {options.map((o) => {
        const on = o.value === value;
        return (
          <Pressable key={o.value} role="radio" aria-checked={on} onPress={() => onChange(o.value)} style={[styles.option, on && styles.optionOn]}>
            <Text style={[styles.optionText, on && styles.optionTextOn]}>{o.tex ? <TeX tex={o.tex} text={o.label} nowrap /> : o.label}</Text>
          </Pressable>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  choice: { flexDirection: 'row', flexWrap: 'wrap', backgroundColor: colors.sunken, borderRadius: radius.md, padding: 3, gap: 3, alignSelf: 'flex-start' },
  option: { paddingHorizontal: space.md, minHeight: TOUCH, justifyContent: 'center', borderRadius: radius.sm },
  optionOn: { backgroundColor: colors.surface, boxShadow: shadows.chosen } as object,
  optionText: { ...type.label, color: colors.inkMuted },
  optionTextOn: { color: colors.ink },
});

import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { Role } from '@/shared/api/groups';
import { colors, radius, space, type } from '@/constants/theme';

/** A segmented choice among the roles the current user may give. */
export function RolePicker({ value, options, onChange, label }: {
  value: Role;
  options: readonly Role[];
  onChange: (role: Role) => void;
  label: string;
}) {
  return (
    <View role="radiogroup" aria-label={label} style={styles.row}>
      {options.map((role) => {
        const selected = role === value;
        return (
          <Pressable
            key={role}
            role="radio"
            aria-checked={selected}
            aria-label={role}
            onPress={() => onChange(role)}
            style={[styles.option, selected && styles.selected]}
          >
            <Text style={[styles.text, selected && styles.selectedText]}>{role}</Text>
          </Pressable>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  row: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    backgroundColor: colors.sunken,
    borderRadius: radius.md,
    padding: 3,
    gap: 3,
    alignSelf: 'flex-start',
  },
  option: { paddingHorizontal: space.md, minHeight: 36, justifyContent: 'center', borderRadius: radius.sm },
  selected: { backgroundColor: colors.surface, boxShadow: '0 1px 2px rgba(28,34,39,0.12)' } as object,
  text: { ...type.label, color: colors.inkMuted, textTransform: 'capitalize' },
  selectedText: { color: colors.ink },
});

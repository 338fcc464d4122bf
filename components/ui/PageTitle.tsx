import { Pressable, StyleSheet, Text, View } from 'react-native';
import { TOUCH, colors, space, type } from '@/constants/theme';

/** The page's own heading (stacks run without native headers); `onBack` adds a back link above it. */
export function PageTitle({ title, kicker, onBack, backLabel = 'Back' }: {
  title: string;
  kicker?: string;
  onBack?: () => void;
  backLabel?: string;
}) {
  return (
    <View style={styles.wrap}>
      {onBack ? (
        <Pressable role="link" onPress={onBack} style={styles.back} accessibilityLabel={backLabel}>
          <Text style={styles.backText}>‹ {backLabel}</Text>
        </Pressable>
      ) : null}
      {kicker ? <Text style={styles.kicker}>{kicker}</Text> : null}
      <Text role="heading" aria-level={1} style={styles.title}>
        {title}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  back: { minHeight: TOUCH - 8, justifyContent: 'center', alignSelf: 'flex-start', marginLeft: -2 },
  backText: { ...type.label, color: colors.accent, fontSize: 15 },
  kicker: { ...type.caps, color: colors.accent },
  title: { ...type.display, color: colors.ink },
});

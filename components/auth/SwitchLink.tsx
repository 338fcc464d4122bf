import { Pressable, StyleSheet, Text } from 'react-native';
import { Link, type Href } from 'expo-router';
import { colors, space, type } from '@/constants/theme';

/** "No account yet? Create one" under a form. */
export function SwitchLink({ prompt, label, href }: { prompt: string; label: string; href: Href }) {
  return (
    <Text style={styles.text}>
      {prompt}{' '}
      <Link href={href} asChild>
        <Pressable role="link" style={styles.hit}>
          <Text style={styles.link}>{label}</Text>
        </Pressable>
      </Link>
    </Text>
  );
}

const styles = StyleSheet.create({
  text: { ...type.small, color: colors.inkMuted, textAlign: 'center' },
  hit: { paddingVertical: space.xs },
  link: { ...type.label, fontSize: 14, color: colors.accent },
});

// Shown by Expo Router in place of a route that threw while rendering.
import { StyleSheet, Text, View } from 'react-native';
import type { ErrorBoundaryProps } from 'expo-router';
import { Button } from '@/components/ui/Button';
import { colors, fonts, space, type } from '@/constants/theme';

export function ErrorBoundary({ error, retry }: ErrorBoundaryProps) {
  return (
    <View role="alert" style={styles.page}>
      <Text style={styles.title}>This page hit a problem</Text>
      <Text style={styles.body}>Your sketches are safe on this device. Try again, or go back and reopen the page.</Text>
      <Text style={styles.detail} selectable>{error.message}</Text>
      <Button label="Try again" onPress={retry} />
    </View>
  );
}

const styles = StyleSheet.create({
  page: { flex: 1, backgroundColor: colors.paper, padding: space.xl, justifyContent: 'center', gap: space.lg, maxWidth: 560, alignSelf: 'center', width: '100%' },
  title: { ...type.display, color: colors.ink, fontFamily: fonts.semibold },
  body: { ...type.body, color: colors.inkMuted },
  detail: { ...type.code, color: colors.danger },
});

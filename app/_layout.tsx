// Root of every route: fonts, providers (gesture root, safe area, TanStack Query, session), the
// error boundary, and the one stack that holds (tabs), (auth) and the invitation page.
import { useEffect } from 'react';
import { StyleSheet } from 'react-native';
import { useFonts } from 'expo-font';
import { Stack } from 'expo-router/js-stack';
import { GestureHandlerRootView } from 'react-native-gesture-handler';
import { SafeAreaProvider } from 'react-native-safe-area-context';
import { QueryClientProvider } from '@tanstack/react-query';
import { queryClient } from '@/lib/query-client';
import { useSession } from '@/hooks/useSession';
import { colors, fonts } from '@/constants/theme';
import '@/lib/offline/register'; // web: the service worker that lets the app load offline

export { ErrorBoundary } from '@/components/shell/ErrorBoundary';

const fontFiles = {
  [fonts.regular]: require('../assets/fonts/IBMPlexSans_400Regular.ttf'),
  [fonts.medium]: require('../assets/fonts/IBMPlexSans_500Medium.ttf'),
  [fonts.semibold]: require('../assets/fonts/IBMPlexSans_600SemiBold.ttf'),
  [fonts.mono]: require('../assets/fonts/IBMPlexMono_400Regular.ttf'),
  [fonts.monoMedium]: require('../assets/fonts/IBMPlexMono_500Medium.ttf'),
};

export default function RootLayout() {
  const [fontsLoaded, fontError] = useFonts(fontFiles);
  const hydrate = useSession((s) => s.hydrate);
  useEffect(() => void hydrate(), [hydrate]);

  // A font that fails to load falls back to the system face rather than a blank app.
  if (!fontsLoaded && !fontError) return null;
  return (
    <GestureHandlerRootView style={styles.root}>
      <SafeAreaProvider>
        <QueryClientProvider client={queryClient}>
          <Stack screenOptions={{ headerShown: false, cardStyle: { backgroundColor: colors.paper } }} />
        </QueryClientProvider>
      </SafeAreaProvider>
    </GestureHandlerRootView>
  );
}

const styles = StyleSheet.create({ root: { flex: 1, backgroundColor: colors.paper } });

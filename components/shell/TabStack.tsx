// The navigator inside each tab: a header-less stack (pages draw their own PageTitle), so a tab
// can push detail routes (a sketch's Slate, a run's result) and keep its place when you switch.
import { Stack } from 'expo-router/js-stack';
import { colors } from '@/constants/theme';

export function TabStack() {
  return <Stack screenOptions={{ headerShown: false, cardStyle: { backgroundColor: colors.paper } }} />;
}

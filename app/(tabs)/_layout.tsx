// The signed-in shell: bottom tabs on phones, a side rail on wide screens (>= 1024 px), same
// destinations (components/shell/destinations.ts). Each tab is a folder with its own stack.
// Keyboard shortcuts on the web: components/shell/shortcuts.ts.
import { View } from 'react-native';
import { Redirect, usePathname } from 'expo-router';
import { Tabs } from 'expo-router/js-tabs';
import { AppTabBar } from '@/components/shell/AppTabBar';
import { ShortcutsHost } from '@/components/shell/ShortcutsHost';
import { destinations } from '@/components/shell/destinations';
import { useIsWide } from '@/components/shell/useIsWide';
import { useSession } from '@/hooks/useSession';
import { visitedPath, withNext } from '@/lib/next-path';
import { colors } from '@/constants/theme';

export default function TabsLayout() {
  const status = useSession((s) => s.status);
  const pathname = usePathname();
  const wide = useIsWide();

  if (status === 'loading') return <View style={{ flex: 1, backgroundColor: colors.paper }} />;
  if (status === 'signedOut') return <Redirect href={withNext('/sign-in', visitedPath(pathname))} />;
  return (
    <>
      <Tabs
        tabBar={(props) => <AppTabBar {...props} wide={wide} />}
        screenOptions={{
          headerShown: false,
          tabBarPosition: wide ? 'left' : 'bottom',
          sceneStyle: { backgroundColor: colors.paper },
        }}
      >
        {destinations.map((d) => (
          <Tabs.Screen key={d.name} name={d.name} options={{ title: d.label }} />
        ))}
      </Tabs>
      <ShortcutsHost />
    </>
  );
}

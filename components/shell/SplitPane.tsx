// List + detail. Phone: a stack (the index route shows the list, details push over it).
// Wide: the list stays on the left and the current child route fills the right pane.
// Use it as a tab folder's _layout: `export default () => <SplitPane list={<MyList />} />`, and
// in that folder's index.tsx render the list on phones and a "pick one" hint when wide.
import { StyleSheet, View } from 'react-native';
import { Slot } from 'expo-router';
import { colors } from '@/constants/theme';
import { TabStack } from './TabStack';
import { useIsWide } from './useIsWide';

export function SplitPane({ list }: { list: React.ReactNode }) {
  const wide = useIsWide();
  if (!wide) return <TabStack />;
  return (
    <View style={styles.row}>
      <View style={styles.list}>{list}</View>
      <View style={styles.detail}>
        <Slot />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flex: 1, flexDirection: 'row', backgroundColor: colors.paper },
  list: { width: 420, borderRightWidth: 1, borderRightColor: colors.line },
  detail: { flex: 1 },
});

// List + detail inside a tab. Phone: one stack (the index route shows the list, details push
// over it). Wide: the list stays on the left and the same stack fills the right pane, so
// resizing keeps the open detail. Use it as a tab folder's _layout:
// `export default () => <SplitPane list={<MyList />} />`, and in that folder's index.tsx render
// the list on phones and a "pick one" hint when wide (see app/(tabs)/account/).
import { StyleSheet, View } from 'react-native';
import { colors } from '@/constants/theme';
import { TabStack } from './TabStack';
import { useIsWide } from './useIsWide';

/** `listHidden`: a detail that needs the whole width (a run's focus view) hides the list pane. */
export function SplitPane({ list, listHidden = false }: { list: React.ReactNode; listHidden?: boolean }) {
  const wide = useIsWide();
  return (
    <View style={styles.row}>
      {wide && !listHidden ? <View style={styles.list}>{list}</View> : null}
      <View style={styles.detail}>
        <TabStack />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flex: 1, flexDirection: 'row', backgroundColor: colors.paper },
  list: { width: 420, borderRightWidth: 1, borderRightColor: colors.line },
  detail: { flex: 1 },
});

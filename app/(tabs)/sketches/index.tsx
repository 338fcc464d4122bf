// The sketchbook. Phone: the list. Wide: the list is already on the left; this pane says what to do.
import { StyleSheet, Text, View } from 'react-native';
import { router } from 'expo-router';
import { SketchList } from '@/components/slate/SketchList';
import { useIsWide } from '@/components/shell/useIsWide';
import { Button } from '@/components/ui/Button';
import { colors, slate, space, type } from '@/constants/theme';

export default function SketchesIndex() {
  const wide = useIsWide();
  if (!wide) return <SketchList />;
  return (
    <View style={styles.pane}>
      <View style={styles.board}>
        <Text style={styles.text}>Open a sketch from the list, or start a new one: draw, paste a code or build one from a family.</Text>
        <Button label="New sketch" onPress={() => router.push('/sketches/new')} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  pane: { flex: 1, padding: space.xl, backgroundColor: colors.paper },
  board: { flex: 1, borderRadius: 18, backgroundColor: slate.surface, alignItems: 'center', justifyContent: 'center', gap: space.xl, padding: space.xxl },
  text: { ...type.body, color: slate.chalkDim, textAlign: 'center', maxWidth: 380 },
});

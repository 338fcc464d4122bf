// One sketch on the Slate, read from the device store.
import { StyleSheet, Text, View } from 'react-native';
import { useLocalSearchParams } from 'expo-router';
import { useLocalSketch } from '@/hooks/queries/useLocalSketches';
import { useDropIfEmpty } from '@/hooks/useDropIfEmpty';
import { FRESH_PARAM } from '@/lib/slate/fresh';
import { SlateScreen } from '@/components/slate/SlateScreen';
import { colors, space, type } from '@/constants/theme';

export default function SketchRoute() {
  const params = useLocalSearchParams<{ id: string; [FRESH_PARAM]?: string }>();
  const sketch = useLocalSketch(params.id);
  useDropIfEmpty(params.id, params[FRESH_PARAM] === '1');
  if (sketch.data) return <SlateScreen sketch={sketch.data} />;
  return (
    <View style={styles.pane}>
      {sketch.data === null || sketch.isError ? <Text style={styles.text}>This sketch is not on this device.</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  pane: { flex: 1, padding: space.xxl, backgroundColor: colors.paper, alignItems: 'center', justifyContent: 'center' },
  text: { ...type.body, color: colors.inkMuted },
});

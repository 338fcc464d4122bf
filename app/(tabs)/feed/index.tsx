// The group feed. Phone: the list itself. Wide: the list is already on the left, so hint at the right pane.
import { StyleSheet, Text, View } from 'react-native';
import { FeedList } from '@/components/feed/FeedList';
import { useIsWide } from '@/components/shell/useIsWide';
import { colors, space, type } from '@/constants/theme';

export default function FeedScreen() {
  const wide = useIsWide();
  if (!wide) return <FeedList />;
  return (
    <View style={styles.hint}>
      <Text style={styles.text}>Open a shared sketch to see its photos, discussion and related sketches.</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  hint: { flex: 1, alignItems: 'center', justifyContent: 'center', padding: space.xxl },
  text: { ...type.body, color: colors.inkFaint, textAlign: 'center', maxWidth: 360 },
});

import { StyleSheet, Text, View } from 'react-native';
import { AccountOverview } from '@/components/account/AccountOverview';
import { useIsWide } from '@/components/shell/useIsWide';
import { colors, space, type } from '@/constants/theme';

/** Phone: the overview itself. Wide: the overview is already on the left, so hint at the right pane. */
export default function AccountIndex() {
  const wide = useIsWide();
  if (!wide) return <AccountOverview />;
  return (
    <View style={styles.hint}>
      <Text style={styles.text}>Open a group to see its members, roles and invitations.</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  hint: { flex: 1, alignItems: 'center', justifyContent: 'center', padding: space.xxl },
  text: { ...type.body, color: colors.inkFaint, textAlign: 'center', maxWidth: 360 },
});

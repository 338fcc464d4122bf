// The Runs tab's list pane on a wide screen: the runs, and a way back to the start form (the
// right pane shows a run or the form; "New run" pops the runs opened since back to it).
import { View, StyleSheet } from 'react-native';
import { useGlobalSearchParams, useRouter } from 'expo-router';
import { Screen } from '@/components/ui/Screen';
import { PageTitle } from '@/components/ui/PageTitle';
import { Button } from '@/components/ui/Button';
import { RunsOverview } from './RunsOverview';

export function RunsPane() {
  const router = useRouter();
  const { id, sketchId } = useGlobalSearchParams<{ id?: string; sketchId?: string }>();
  return (
    <Screen>
      <PageTitle kicker="Server" title="Runs" />
      {id ? (
        <View style={styles.row}>
          <Button variant="secondary" label="New run" onPress={() => router.dismissTo('/runs')} />
        </View>
      ) : null}
      <RunsOverview formWhere="on the right" hideEmpty={!!sketchId} />
    </Screen>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row' },
});

// The group feed. Later: shared sketches, comments, forks, "same invariants as" links.
import { useRouter } from 'expo-router';
import { Screen } from '@/components/ui/Screen';
import { PageTitle } from '@/components/ui/PageTitle';
import { EmptyState } from '@/components/ui/EmptyState';
import { Button } from '@/components/ui/Button';
import { FeedIcon } from '@/components/shell/icons';
import { colors } from '@/constants/theme';

export default function FeedScreen() {
  const router = useRouter();
  return (
    <Screen>
      <PageTitle kicker="Group" title="Feed" />
      <EmptyState art={<FeedIcon color={colors.inkFaint} size={40} />} title="Nothing shared yet"
        action={<Button variant="secondary" label="Open my groups" onPress={() => router.navigate('/account')} />}>
        When you or someone in your group shares a sketch, it appears here to comment on, fork into your
        sketchbook, or start a run from. Join or create a group under Account first.
      </EmptyState>
    </Screen>
  );
}

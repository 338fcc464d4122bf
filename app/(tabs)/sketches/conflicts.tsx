// Conflict copies to compare and resolve (sync/SPEC.md S20, S21).
import { Screen } from '@/components/ui/Screen';
import { PageTitle } from '@/components/ui/PageTitle';
import { Conflicts } from '@/components/sync/Conflicts';
import { SyncStatus } from '@/components/sync/SyncStatus';

export default function ConflictsRoute() {
  return (
    <Screen>
      <PageTitle kicker="Sync" title="Conflicts" />
      <SyncStatus />
      <Conflicts />
    </Screen>
  );
}

// The members page of a group (owners and admins): roster with joined / last active, roles, invitations.
import { useLocalSearchParams, useRouter } from 'expo-router';
import { useGroup } from '@/hooks/queries/useGroups';
import { canManage } from '@/shared/api/roles';
import { MembersTable } from '@/components/groups/MembersTable';
import { Screen } from '@/components/ui/Screen';
import { PageTitle } from '@/components/ui/PageTitle';
import { Banner } from '@/components/ui/Banner';

export default function MembersScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const router = useRouter();
  const group = useGroup(id);
  const back = () => (router.canGoBack() ? router.back() : router.replace(`/account/groups/${id}`));
  return (
    <Screen wide>
      <PageTitle kicker={group.data?.name ?? 'Group'} title="Members" onBack={back} backLabel="Group" />
      {group.data && !canManage(group.data.role) ? (
        <Banner tone="info" title="For owners and admins">The members page is open to the group's owners and admins.</Banner>
      ) : null}
      {group.isError ? <Banner tone="error">{group.error.message}</Banner> : null}
      {group.data && canManage(group.data.role) ? <MembersTable groupId={id} myRole={group.data.role} /> : null}
    </Screen>
  );
}

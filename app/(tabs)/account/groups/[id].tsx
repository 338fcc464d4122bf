// One group: my role, members with roles, and (owners and admins only) invitations and member controls.
import { StyleSheet, Text, View } from 'react-native';
import { useLocalSearchParams, useRouter } from 'expo-router';
import { useGroup } from '@/hooks/queries/useGroups';
import { useLeaveGroup, useMembers } from '@/hooks/queries/useMembers';
import { usePendingInvitations } from '@/hooks/queries/useInvitations';
import { useSession } from '@/hooks/useSession';
import { canManage } from '@/shared/api/roles';
import { roleDescriptions } from '@/lib/role-descriptions';
import { useIsWide } from '@/components/shell/useIsWide';
import { Screen } from '@/components/ui/Screen';
import { PageTitle } from '@/components/ui/PageTitle';
import { Section } from '@/components/ui/Section';
import { Banner } from '@/components/ui/Banner';
import { LoadError } from '@/components/ui/LoadError';
import { Button } from '@/components/ui/Button';
import { RoleBadge } from '@/components/ui/RoleBadge';
import { InviteForm } from '@/components/groups/InviteForm';
import { MemberRow } from '@/components/groups/MemberRow';
import { colors, space, type } from '@/constants/theme';

export default function GroupScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const router = useRouter();
  const wide = useIsWide();
  const me = useSession((s) => s.user);
  const group = useGroup(id);
  const members = useMembers(id);
  const manager = group.data ? canManage(group.data.role) : false;
  const pending = usePendingInvitations(id, manager);
  const leave = useLeaveGroup(id);
  const back = wide ? undefined : () => (router.canGoBack() ? router.back() : router.replace('/account'));

  if (group.isPending) {
    return <Screen><PageTitle title="Group" onBack={back} backLabel="Account" /></Screen>;
  }
  if (group.isError) {
    return (
      <Screen>
        <PageTitle title="Group" onBack={back} backLabel="Account" />
        <LoadError error={group.error} failed="Could not load the group"
          notFound={{ title: 'Group not found', text: 'This group does not exist, or you are not one of its members.' }} />
      </Screen>
    );
  }
  const { name, role } = group.data;

  return (
    <Screen>
      <PageTitle kicker="Group" title={name} onBack={back} backLabel="Account" />
      <View style={styles.myRole}>
        <Text style={styles.myRoleLabel}>Your role</Text>
        <RoleBadge role={role} />
        <Text style={styles.myRoleText}>{roleDescriptions[role]}</Text>
      </View>

      {manager ? (
        <Section title="Invite someone" note="They get an e-mail with a link that joins this group with the role you choose.">
          <InviteForm groupId={id} myRole={role} />
          {pending.data && pending.data.length > 0 ? (
            <View style={styles.pending}>
              <Text style={styles.pendingTitle}>Waiting for an answer</Text>
              {pending.data.map((inv) => (
                <View key={inv.id} style={styles.pendingRow}>
                  <Text style={styles.pendingEmail} numberOfLines={1}>{inv.email}</Text>
                  <RoleBadge role={inv.role} />
                </View>
              ))}
            </View>
          ) : null}
        </Section>
      ) : (
        <Banner tone="info" title="Invitations are for owners and admins">
          Ask an owner or admin of {name} if someone should join.
        </Banner>
      )}

      <Section title={members.data ? `Members · ${members.data.length}` : 'Members'}>
        {members.isError ? <Banner tone="error">{members.error.message}</Banner> : null}
        {manager ? <Button variant="secondary" label="Members table" onPress={() => router.push(`/account/members/${id}`)} /> : null}
        <View>
          {members.data?.map((m, i) => (
            <MemberRow key={m.userId} groupId={id} member={m} myRole={role} isMe={m.userId === me?.id} first={i === 0} />
          ))}
        </View>
      </Section>

      <View style={styles.leave}>
        {leave.error ? <Banner tone="error">{leave.error.message}</Banner> : null}
        <Button variant="danger" label="Leave group" busyLabel="Leaving…" busy={leave.isPending}
          onPress={() => leave.mutate(undefined, { onSuccess: () => router.replace('/account') })} />
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  myRole: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm, marginTop: -space.sm },
  myRoleLabel: { ...type.small, color: colors.inkMuted },
  myRoleText: { ...type.small, color: colors.inkMuted, flexBasis: '100%' },
  pending: { gap: space.xs, borderTopWidth: 1, borderTopColor: colors.line, paddingTop: space.md },
  pendingTitle: { ...type.label, color: colors.inkMuted },
  pendingRow: { flexDirection: 'row', alignItems: 'center', gap: space.md, minHeight: 36 },
  pendingEmail: { ...type.code, color: colors.ink, flex: 1 },
  leave: { gap: space.sm, alignItems: 'flex-start' },
});

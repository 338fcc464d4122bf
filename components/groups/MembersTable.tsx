// The members page (owners and admins): who, role (changeable where the rules allow), joined,
// last active, remove; pending invitations with resend and revoke. A table on wide screens,
// one card per person on a phone.
import { StyleSheet, Text, View } from 'react-native';
import type { Role } from '@/shared/api/groups';
import type { RosterEntry } from '@/shared/api/members';
import { useChangeRole, useRemoveMember } from '@/hooks/queries/useMembers';
import { usePendingInvitations } from '@/hooks/queries/useInvitations';
import { useResendInvitation, useRevokeInvitation, useRoster } from '@/hooks/queries/useRoster';
import { useSession } from '@/hooks/useSession';
import { assignableRoles, canEditMember } from '@/shared/api/roles';
import { useIsWide } from '@/components/shell/useIsWide';
import { when } from '@/lib/when';
import { Banner } from '@/components/ui/Banner';
import { RoleBadge } from '@/components/ui/RoleBadge';
import { RolePicker } from '@/components/ui/RolePicker';
import { Section } from '@/components/ui/Section';
import { colors, fonts, space, type } from '@/constants/theme';

const day = (iso: string) => new Date(iso).toLocaleDateString(undefined, { day: 'numeric', month: 'short', year: 'numeric' });

function Row({ groupId, m, myRole, isMe, wide, first }: { groupId: string; m: RosterEntry; myRole: Role; isMe: boolean; wide: boolean; first: boolean }) {
  const change = useChangeRole(groupId);
  const remove = useRemoveMember(groupId);
  const editable = !isMe && canEditMember(myRole, m.role);
  const error = change.error ?? remove.error;
  return (
    <View role="row" style={[styles.row, wide && styles.rowWide, first && !wide && styles.firstRow]} testID={`roster-${m.email}`}>
      <View role="cell" style={wide ? styles.cName : undefined}>
        <Text style={styles.name}>{m.displayName}{isMe ? <Text style={styles.muted}>  (you)</Text> : null}</Text>
        <Text style={styles.email} numberOfLines={1}>{m.email}</Text>
      </View>
      <View role="cell" style={wide ? styles.cRole : styles.start}>
        {editable ? (
          <RolePicker label={`Role of ${m.displayName}`} value={m.role} options={assignableRoles(myRole)}
            onChange={(role) => role !== m.role && change.mutate({ userId: m.userId, role })} />
        ) : <RoleBadge role={m.role} />}
      </View>
      <Text role="cell" style={[styles.cell, wide && styles.cDate]}>{wide ? '' : 'Joined '}{day(m.joinedAt)}</Text>
      <Text role="cell" style={[styles.cell, wide && styles.cDate]}>{wide ? '' : 'Active '}{m.lastActiveAt ? when(m.lastActiveAt) : 'not seen yet'}</Text>
      <View role="cell" style={wide ? styles.cAct : undefined}>
        {editable ? <Text role="button" style={styles.danger} onPress={() => remove.mutate(m.userId)}>Remove</Text> : null}
      </View>
      {error ? <Banner tone="error">{error.message}</Banner> : null}
    </View>
  );
}

export function MembersTable({ groupId, myRole }: { groupId: string; myRole: Role }) {
  const wide = useIsWide();
  const me = useSession((s) => s.user);
  const roster = useRoster(groupId, true);
  const pending = usePendingInvitations(groupId, true);
  const resend = useResendInvitation(groupId);
  const revoke = useRevokeInvitation(groupId);
  return (
    <>
      <Section title={roster.data ? `In the group · ${roster.data.length}` : 'In the group'}>
        {roster.isError ? <Banner tone="error">{roster.error.message}</Banner> : null}
        <View role="table" aria-label="Members">
          {wide ? (
            <View role="row" style={[styles.rowWide, styles.headRow]}>
              {['Member', 'Role', 'Joined', 'Last active', ''].map((h, i) => (
                <Text key={i} role="columnheader" style={[styles.head, [styles.cName, styles.cRole, styles.cDate, styles.cDate, styles.cAct][i]]}>{h}</Text>
              ))}
            </View>
          ) : null}
          {roster.data?.map((m, k) => <Row key={m.userId} groupId={groupId} m={m} myRole={myRole} isMe={m.userId === me?.id} wide={wide} first={k === 0} />)}
        </View>
      </Section>
      <Section title="Pending invitations">
        {pending.data?.length === 0 ? <Text style={styles.muted}>No invitation is waiting for an answer.</Text> : null}
        {pending.data?.map((inv) => (
          <View key={inv.id} style={styles.inv}>
            <Text style={styles.email} numberOfLines={1}>{inv.email}</Text>
            <RoleBadge role={inv.role} />
            <Text style={styles.muted}>until {day(inv.expiresAt)}</Text>
            <Text role="button" style={styles.action} onPress={() => resend.mutate(inv.id)}>Resend</Text>
            <Text role="button" style={styles.danger} onPress={() => revoke.mutate(inv.id)}>Revoke</Text>
          </View>
        ))}
        {resend.isSuccess ? <Banner tone="success">Sent again with a new link; the old link no longer works.</Banner> : null}
        {resend.error || revoke.error ? <Banner tone="error">{(resend.error ?? revoke.error)!.message}</Banner> : null}
      </Section>
    </>
  );
}

const styles = StyleSheet.create({
  row: { gap: space.xs, paddingVertical: space.md, borderTopWidth: 1, borderTopColor: colors.line },
  // On a phone there is no header row above the first member: no rule either.
  firstRow: { borderTopWidth: 0, paddingTop: 0 },
  rowWide: { flexDirection: 'row', alignItems: 'center', gap: space.md, flexWrap: 'wrap' },
  headRow: { paddingBottom: space.sm },
  head: { ...type.caps, color: colors.inkMuted },
  cName: { flex: 3, minWidth: 180 },
  cRole: { flex: 4, minWidth: 200, alignItems: 'flex-start' },
  cDate: { flex: 2, minWidth: 96 },
  cAct: { flex: 1, minWidth: 64 },
  start: { alignItems: 'flex-start' },
  name: { ...type.heading, color: colors.ink },
  email: { fontFamily: fonts.mono, fontSize: 13, color: colors.inkMuted, flexShrink: 1 },
  cell: { ...type.small, color: colors.ink },
  muted: { ...type.small, color: colors.inkMuted },
  action: { ...type.label, color: colors.accent },
  danger: { ...type.label, color: colors.danger },
  inv: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md, minHeight: 40 },
});

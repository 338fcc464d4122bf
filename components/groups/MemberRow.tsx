import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { Member, Role } from '@/shared/api/groups';
import { useChangeRole, useRemoveMember } from '@/hooks/queries/useMembers';
import { isApiError } from '@/lib/api';
import { assignableRoles, canEditMember } from '@/shared/api/roles';
import { Banner } from '@/components/ui/Banner';
import { Button } from '@/components/ui/Button';
import { RoleBadge } from '@/components/ui/RoleBadge';
import { RolePicker } from '@/components/ui/RolePicker';
import { colors, space, type } from '@/constants/theme';

/** One member; owners and admins get role and removal controls where the rules allow them. */
export function MemberRow({ groupId, member, myRole, isMe, first }: {
  groupId: string;
  member: Member;
  myRole: Role;
  isMe: boolean;
  first: boolean;
}) {
  const [editing, setEditing] = useState(false);
  const [confirmRemove, setConfirmRemove] = useState(false);
  const changeRole = useChangeRole(groupId);
  const remove = useRemoveMember(groupId);
  const editable = !isMe && canEditMember(myRole, member.role);
  const error = changeRole.error ?? remove.error;

  const pick = (role: Role) => {
    if (role === member.role) return setEditing(false);
    changeRole.mutate({ userId: member.userId, role }, { onSuccess: () => setEditing(false) });
  };

  return (
    <View style={[styles.row, !first && styles.divided]} testID={`member-${member.email}`}>
      <View style={styles.head}>
        <View style={styles.who}>
          <Text style={styles.name}>
            {member.displayName}
            {isMe ? <Text style={styles.me}>  (you)</Text> : null}
          </Text>
          <Text style={styles.email}>{member.email}</Text>
        </View>
        <RoleBadge role={member.role} />
      </View>
      {editable ? (
        <View style={styles.controls}>
          {editing ? (
            <RolePicker label={`Role of ${member.displayName}`} value={member.role} options={assignableRoles(myRole)} onChange={pick} />
          ) : (
            <Button variant="quiet" label="Change role" onPress={() => setEditing(true)} />
          )}
          {confirmRemove ? (
            <Button variant="danger" label={`Remove ${member.displayName}`} busyLabel="Removing…" busy={remove.isPending}
              onPress={() => remove.mutate(member.userId)} />
          ) : (
            <Button variant="quiet" label="Remove" onPress={() => setConfirmRemove(true)} />
          )}
        </View>
      ) : null}
      {error ? <Banner tone="error">{isApiError(error) ? error.message : 'The change failed.'}</Banner> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { gap: space.sm, paddingVertical: space.sm },
  divided: { borderTopWidth: 1, borderTopColor: colors.line, paddingTop: space.md },
  head: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  who: { flex: 1, gap: 1 },
  name: { ...type.heading, color: colors.ink },
  me: { ...type.small, color: colors.inkMuted },
  email: { ...type.small, color: colors.inkMuted },
  controls: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, alignItems: 'center', marginLeft: -space.lg },
});

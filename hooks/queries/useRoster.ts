import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { Invitation } from '@/shared/api/groups';
import { Roster, memberPaths } from '@/shared/api/members';
import { groupPaths } from '@/shared/api/groups';
import { api } from '@/lib/api';
import { keys } from './keys';

export function useRoster(groupId: string, enabled: boolean) {
  return useQuery({ queryKey: [...keys.groups.members(groupId), 'roster'], enabled, queryFn: () => api('GET', memberPaths.roster(groupId), Roster) });
}

export function useResendInvitation(groupId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (invitationId: string) => api('POST', memberPaths.resend(groupId, invitationId), Invitation),
    onSuccess: () => qc.invalidateQueries({ queryKey: keys.groups.invitations(groupId) }),
  });
}

export function useRevokeInvitation(groupId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (invitationId: string) => api('DELETE', groupPaths.pendingInvitation(groupId, invitationId), null),
    onSuccess: () => qc.invalidateQueries({ queryKey: keys.groups.invitations(groupId) }),
  });
}

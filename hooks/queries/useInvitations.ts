import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import {
  AcceptInvitationResponse,
  Invitation,
  InvitationList,
  InvitationPreview,
  groupPaths,
  type CreateInvitationRequest,
} from '@/shared/api/groups';
import { api } from '@/lib/api';
import { keys } from './keys';

/** Pending invitations of a group (owner/admin only: pass enabled=false for other roles). */
export function usePendingInvitations(groupId: string, enabled: boolean) {
  return useQuery({
    queryKey: keys.groups.invitations(groupId),
    queryFn: () => api('GET', groupPaths.invitations(groupId), InvitationList),
    enabled,
  });
}

export function useInvite(groupId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateInvitationRequest) => api('POST', groupPaths.invitations(groupId), Invitation, body),
    onSuccess: () => qc.invalidateQueries({ queryKey: keys.groups.invitations(groupId) }),
  });
}

/** What an invitation link offers; readable signed out. */
export function useInvitationPreview(token: string) {
  return useQuery({
    queryKey: keys.invitation(token),
    queryFn: () => api('GET', groupPaths.invitation(token), InvitationPreview),
  });
}

export function useAcceptInvitation(token: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api('POST', groupPaths.accept(token), AcceptInvitationResponse),
    onSuccess: () => {
      qc.invalidateQueries({ queryKey: keys.groups.all() });
      qc.invalidateQueries({ queryKey: keys.invitation(token) });
    },
  });
}

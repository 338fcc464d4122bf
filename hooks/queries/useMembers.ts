import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { Member, MemberList, groupPaths, type Role } from '@/shared/api/groups';
import { api } from '@/lib/api';
import { keys } from './keys';

export function useMembers(groupId: string) {
  return useQuery({
    queryKey: keys.groups.members(groupId),
    queryFn: () => api('GET', groupPaths.members(groupId), MemberList),
  });
}

export function useChangeRole(groupId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, role }: { userId: string; role: Role }) =>
      api('PATCH', groupPaths.member(groupId, userId), Member, { role }),
    // My own role may have changed too, so refresh the whole group.
    onSuccess: () => qc.invalidateQueries({ queryKey: keys.groups.all() }),
  });
}

export function useRemoveMember(groupId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (userId: string) => api('DELETE', groupPaths.member(groupId, userId), null),
    onSuccess: () => qc.invalidateQueries({ queryKey: keys.groups.all() }),
  });
}

export function useLeaveGroup(groupId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api('POST', groupPaths.leave(groupId), null),
    onSuccess: () => qc.invalidateQueries({ queryKey: keys.groups.all() }),
  });
}

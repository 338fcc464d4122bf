import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { GroupList, GroupSummary, groupPaths, type CreateGroupRequest } from '@/shared/api/groups';
import { api } from '@/lib/api';
import { keys } from './keys';

/** My groups, each with my role in it. */
export function useGroups() {
  return useQuery({ queryKey: keys.groups.list(), queryFn: () => api('GET', groupPaths.groups, GroupList) });
}

export function useGroup(id: string) {
  return useQuery({ queryKey: keys.groups.detail(id), queryFn: () => api('GET', groupPaths.group(id), GroupSummary) });
}

export function useCreateGroup() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateGroupRequest) => api('POST', groupPaths.groups, GroupSummary, body),
    onSuccess: () => qc.invalidateQueries({ queryKey: keys.groups.list() }),
  });
}

// Sketches read from the device store (never from the network: sync/SPEC.md S8, S17), kept
// fresh by the store's change notifications.
import { useEffect } from 'react';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { SketchFields, SketchFieldsPatch } from '@/shared/api/sketches';
import type { LocalComment, LocalGroup } from '@/lib/store/types';
import { useDevice } from '@/hooks/useDevice';
import { useGroups } from './useGroups';

export const localKeys = {
  all: (userId: string) => ['local', userId] as const,
  sketches: (userId: string) => [...localKeys.all(userId), 'sketches'] as const,
  sketch: (userId: string, id: string) => [...localKeys.all(userId), 'sketch', id] as const,
  conflicts: (userId: string) => [...localKeys.all(userId), 'conflicts'] as const,
  groups: (userId: string) => [...localKeys.all(userId), 'groups'] as const,
  comments: (userId: string, sketchId: string) => [...localKeys.all(userId), 'comments', sketchId] as const,
  rejected: (userId: string, recordId: string) => [...localKeys.all(userId), 'rejected', recordId] as const,
};

/** Every local query of this user refreshes when the store changes (local write or pull). */
function useStoreRefresh() {
  const device = useDevice();
  const qc = useQueryClient();
  useEffect(() => {
    if (!device) return;
    return device.store.subscribe(() => void qc.invalidateQueries({ queryKey: localKeys.all(device.userId) }));
  }, [device, qc]);
  return device;
}

const local = { staleTime: Infinity, networkMode: 'always' as const };

export function useLocalSketches() {
  const device = useStoreRefresh();
  return useQuery({
    ...local,
    queryKey: localKeys.sketches(device?.userId ?? ''),
    queryFn: () => device!.store.list(),
    enabled: !!device,
  });
}

export function useLocalSketch(id: string) {
  const device = useStoreRefresh();
  return useQuery({
    ...local,
    queryKey: localKeys.sketch(device?.userId ?? '', id),
    queryFn: () => device!.store.get(id),
    enabled: !!device,
  });
}

export function useConflicts() {
  const device = useStoreRefresh();
  return useQuery({
    ...local,
    queryKey: localKeys.conflicts(device?.userId ?? ''),
    queryFn: () => device!.store.conflicts(),
    enabled: !!device,
  });
}

/**
 * My groups with my role: from the server when it answers, else as the device last saw them,
 * so the Slate can share and name groups offline.
 */
export function useKnownGroups(): LocalGroup[] {
  const device = useStoreRefresh();
  const remote = useGroups();
  useEffect(() => {
    if (device && remote.data) void device.store.rememberGroups(remote.data);
  }, [device, remote.data]);
  const cached = useQuery({
    ...local,
    queryKey: localKeys.groups(device?.userId ?? ''),
    queryFn: () => device!.store.groups(),
    enabled: !!device && !remote.data,
  });
  return remote.data ?? cached.data ?? [];
}

export const groupName = (groups: LocalGroup[], id: string) => groups.find((g) => g.id === id)?.name ?? 'a group';

/** Comments written on this device for one sketch (S34), with their waiting / sent / refused state. */
export function useLocalComments(sketchId: string) {
  const device = useStoreRefresh();
  return useQuery({
    ...local,
    queryKey: localKeys.comments(device?.userId ?? '', sketchId),
    queryFn: () => device!.store.comments(sketchId),
    enabled: !!device,
  });
}

/** S24: this sketch's writes the server refused, kept with the reason until dismissed. */
export function useRejected(sketchId: string) {
  const device = useStoreRefresh();
  return useQuery({
    ...local,
    queryKey: localKeys.rejected(device?.userId ?? '', sketchId),
    queryFn: () => device!.store.rejected(sketchId),
    enabled: !!device,
  });
}

export function useSketchWrites() {
  const device = useDevice();
  const need = () => {
    if (!device) throw new Error('The device store is not open yet');
    return device.store;
  };
  const opts = { networkMode: 'always' as const };
  return {
    create: useMutation({ ...opts, mutationFn: (init: Partial<SketchFields>) => need().create(init) }),
    update: useMutation({ ...opts, mutationFn: ({ id, patch }: { id: string; patch: SketchFieldsPatch }) => need().update(id, patch) }),
    remove: useMutation({ ...opts, mutationFn: (id: string) => need().remove(id) }),
    discardComment: useMutation({ ...opts, mutationFn: (c: LocalComment) => need().discardComment(c) }),
    dismissRejected: useMutation({ ...opts, mutationFn: (mutationId: string) => need().dismissRejected(mutationId) }),
    resolve: useMutation({
      ...opts,
      mutationFn: ({ conflictId, chosen }: { conflictId: string; chosen: SketchFieldsPatch }) => need().resolveConflict(conflictId, chosen),
    }),
  };
}

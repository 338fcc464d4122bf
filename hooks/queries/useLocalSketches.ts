// Sketches read from the device store (never from the network: sync/SPEC.md S8, S17), kept
// fresh by the store's change notifications.
import { useEffect } from 'react';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { SketchFields, SketchFieldsPatch } from '@/shared/api/sketches';
import type { LocalComment, LocalGroup } from '@/lib/store/types';
import type { DeviceStore } from '@/lib/store/tab-owner';
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

/** One read of this user's device store under its key, refreshed on every store change. */
function useLocalQuery<T>(key: (userId: string) => readonly unknown[], read: (store: DeviceStore) => Promise<T>, enabled = true) {
  const device = useStoreRefresh();
  return useQuery({ ...local, queryKey: key(device?.userId ?? ''), queryFn: () => read(device!.store), enabled: !!device && enabled });
}

export const useLocalSketches = () => useLocalQuery(localKeys.sketches, (s) => s.list());

export const useLocalSketch = (id: string) => useLocalQuery((u) => localKeys.sketch(u, id), (s) => s.get(id));

export const useConflicts = () => useLocalQuery(localKeys.conflicts, (s) => s.conflicts());

/**
 * My groups with my role: from the server when it answers, else as the device last saw them,
 * so the Slate can share and name groups offline.
 */
export function useKnownGroups(): LocalGroup[] {
  const device = useDevice();
  const remote = useGroups();
  useEffect(() => {
    if (device && remote.data) void device.store.rememberGroups(remote.data);
  }, [device, remote.data]);
  const cached = useLocalQuery(localKeys.groups, (s) => s.groups(), !remote.data);
  return remote.data ?? cached.data ?? [];
}

export const groupName = (groups: LocalGroup[], id: string) => groups.find((g) => g.id === id)?.name ?? 'a group';

/** Comments written on this device for one sketch (S34), with their waiting / sent / refused state. */
export const useLocalComments = (sketchId: string) => useLocalQuery((u) => localKeys.comments(u, sketchId), (s) => s.comments(sketchId));

/** S24: this sketch's writes the server refused, kept with the reason until dismissed. */
export const useRejected = (sketchId: string) => useLocalQuery((u) => localKeys.rejected(u, sketchId), (s) => s.rejected(sketchId));

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

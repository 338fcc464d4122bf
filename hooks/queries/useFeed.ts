// The group feed, a shared sketch's page and what can be done there (comment, fork, photos,
// share). Keys live under ['feed', groupId] so one invalidation refreshes list and pages.
import { useCallback, useEffect, useRef } from 'react';
import { useInfiniteQuery, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { Comment, commentPaths } from '@/shared/api/comments';
import { FeedPage, ForkResponse, GroupSketch, ShareResponse, feedPaths } from '@/shared/api/feed';
import { Photo, photoPaths } from '@/shared/api/photos';
import { MemberList, groupPaths } from '@/shared/api/groups';
import { SketchList, sketchPaths } from '@/shared/api/sketches';
import { api, isApiError } from '@/lib/api';
import { randomId } from '@/lib/crypto';
import { syncStatus } from '@/lib/store/device';
import type { LocalComment } from '@/lib/store/types';
import { useDevice } from '@/hooks/useDevice';
import { keys } from './keys';
import { useLocalComments } from './useLocalSketches';

export interface FeedFilters {
  tag?: string;
  person?: string;
  hasResults?: boolean;
}

export const feedKeys = {
  all: () => ['feed'] as const,
  group: (groupId: string) => [...feedKeys.all(), groupId] as const,
  list: (groupId: string, f: FeedFilters) => [...feedKeys.group(groupId), 'list', f] as const,
  sketch: (groupId: string, sketchId: string) => [...feedKeys.group(groupId), 'sketch', sketchId] as const,
  mySketches: () => [...feedKeys.all(), 'my-sketches'] as const,
};

/** While the server computes a Jones polynomial (off its request thread), the page asks again this often. */
const COMPUTING_POLL_MS = 3_000;

function feedPath(groupId: string, f: FeedFilters, cursor: number | null): string {
  const q = new URLSearchParams();
  if (cursor) q.set('cursor', String(cursor));
  if (f.tag) q.set('tag', f.tag);
  if (f.person) q.set('person', f.person);
  if (f.hasResults) q.set('hasResults', 'true');
  const s = q.toString();
  return feedPaths.feed(groupId) + (s ? `?${s}` : '');
}

export function useFeed(groupId: string | null, filters: FeedFilters) {
  return useInfiniteQuery({
    queryKey: feedKeys.list(groupId ?? '', filters),
    enabled: !!groupId,
    initialPageParam: null as number | null,
    queryFn: ({ pageParam }) => api('GET', feedPath(groupId!, filters, pageParam), FeedPage),
    getNextPageParam: (last) => last.nextCursor,
    refetchInterval: (q) => (q.state.data?.pages.some((p) => p.items.some((i) => i.invariants.computing)) ? COMPUTING_POLL_MS : false),
  });
}

export function useGroupSketch(groupId: string, sketchId: string) {
  return useQuery({
    queryKey: feedKeys.sketch(groupId, sketchId),
    queryFn: () => api('GET', feedPaths.groupSketch(groupId, sketchId), GroupSketch),
    refetchInterval: (q) => (q.state.data?.invariants.computing ? COMPUTING_POLL_MS : false),
  });
}

/** After any change on a sketch page: the page and the feed (comment counts, thumbnails). */
function useRefreshGroup(groupId: string) {
  const qc = useQueryClient();
  return useCallback(() => qc.invalidateQueries({ queryKey: feedKeys.group(groupId) }), [qc, groupId]);
}

/**
 * Online the comment posts at once. Offline, or when the post does not reach the server, it
 * waits in the device store and the sync engine posts it (sync/SPEC.md S34). Both carry the same
 * id made here, so a post whose answer was lost and is then queued is not a second comment.
 */
export function useAddComment(groupId: string, sketchId: string) {
  const refresh = useRefreshGroup(groupId);
  const device = useDevice();
  return useMutation({
    networkMode: 'always', // offline is handled here, not paused
    mutationFn: async (body: string): Promise<{ queued: boolean }> => {
      const id = randomId();
      const queue = async () => {
        if (!device) throw new Error('Cannot reach the server, and the device store is not open yet to keep the comment.');
        await device.store.addComment(sketchId, body, id);
        return { queued: true };
      };
      if (!syncStatus.getState().online) return queue();
      try {
        await api('POST', commentPaths.comments(sketchId), Comment, { id, body });
        return { queued: false };
      } catch (e) {
        if (isApiError(e, 'network')) return queue();
        throw e;
      }
    },
    onSuccess: (r) => void (r.queued || refresh()),
  });
}

/**
 * My comments on this sketch still on the device: waiting to send, or refused (kept with the
 * reason). When one the device was holding has been sent, the thread reloads to show it.
 */
export function useUnsentComments(groupId: string, sketchId: string): LocalComment[] {
  const local = useLocalComments(sketchId);
  const refresh = useRefreshGroup(groupId);
  const holding = useRef(new Set<string>());
  const list = local.data;
  useEffect(() => {
    if (!list) return;
    const sent = list.some((c) => c.state === 'sent' && holding.current.has(c.id));
    holding.current = new Set(list.filter((c) => c.state === 'waiting').map((c) => c.id));
    if (sent) void refresh();
  }, [list, refresh]);
  return (list ?? []).filter((c) => c.state !== 'sent');
}

export function useEditComment(groupId: string) {
  const refresh = useRefreshGroup(groupId);
  return useMutation({
    mutationFn: ({ id, body }: { id: string; body: string }) => api('PATCH', commentPaths.comment(id), Comment, { body }),
    onSuccess: refresh,
  });
}

export function useDeleteComment(groupId: string) {
  const refresh = useRefreshGroup(groupId);
  return useMutation({ mutationFn: (id: string) => api('DELETE', commentPaths.comment(id), null), onSuccess: refresh });
}

/** The fork reaches this device's sketchbook at once: a pull right after the server made it. */
export function useFork() {
  const device = useDevice();
  return useMutation({
    mutationFn: (sketchId: string) => api('POST', feedPaths.fork(sketchId), ForkResponse),
    onSuccess: () => void device?.engine.syncNow().catch(() => undefined),
  });
}

/** An image the user picked, as the browser or the device hands it over. */
export interface PickedImage {
  uri: string;
  name: string;
  type: string;
  /** Web only: the File itself. */
  file?: Blob;
}

export function useUploadPhoto(groupId: string, sketchId: string) {
  const refresh = useRefreshGroup(groupId);
  return useMutation({
    mutationFn: async (img: PickedImage) => {
      const form = new FormData();
      // Web appends the File; native FormData takes {uri, name, type}.
      form.append('file', (img.file ?? { uri: img.uri, name: img.name, type: img.type }) as Blob, img.name);
      return api('POST', photoPaths.photos(sketchId), Photo, form);
    },
    onSuccess: refresh,
  });
}

export function useDeletePhoto(groupId: string) {
  const refresh = useRefreshGroup(groupId);
  return useMutation({ mutationFn: (photoId: string) => api('DELETE', photoPaths.photo(photoId), null), onSuccess: refresh });
}

/** My sketches as the server holds them (to pick one to share). */
export function useMyServerSketches(enabled: boolean) {
  return useQuery({ queryKey: feedKeys.mySketches(), enabled, queryFn: () => api('GET', sketchPaths.sketches, SketchList) });
}

/**
 * Share or stop sharing. A sketch on this device changes as any local edit does (the Slate's
 * Share dialog writes the same way), then one sync round carries it to the server before the
 * feed reloads; offline it simply waits in the outbox. A sketch the device has not pulled yet
 * goes through the server's share route (the same push on the server side).
 */
export function useShare() {
  const qc = useQueryClient();
  const device = useDevice();
  return useMutation({
    networkMode: 'always',
    mutationFn: async ({ sketchId, groupId }: { sketchId: string; groupId: string | null }): Promise<void> => {
      if (!device || !(await device.store.get(sketchId))) {
        await (groupId ? api('PUT', feedPaths.share(sketchId), ShareResponse, { groupId }) : api('DELETE', feedPaths.share(sketchId), ShareResponse));
        return;
      }
      const refused = async () => (await device.store.counts()).rejected;
      const before = await refused();
      await device.store.update(sketchId, { groupId });
      await device.engine.syncNow().catch(() => undefined); // offline: the next round sends it
      if ((await refused()) > before) throw new Error('The server refused the change: only the owner shares a sketch, and not to a group where they are a viewer.');
    },
    onSuccess: () => qc.invalidateQueries({ queryKey: feedKeys.all() }),
  });
}

/** The people of a group, for the feed's person filter (same cache as the group page's member list). */
export function useGroupPeople(groupId: string | null) {
  return useQuery({ queryKey: keys.groups.members(groupId ?? ''), enabled: !!groupId, queryFn: () => api('GET', groupPaths.members(groupId!), MemberList) });
}

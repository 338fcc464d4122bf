// Runs on the group server: the list, one run (polled every second while it has not ended,
// so the progress bar moves), start and cancel.
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { isFinished, RunDetail, RunList, runPaths, type StartRunRequest } from '@/shared/api/runs';
import { api } from '@/lib/api';

export const runKeys = {
  all: () => ['runs'] as const,
  list: (scope: RunScope) => [...runKeys.all(), 'list', scope] as const,
  detail: (id: string) => [...runKeys.all(), 'detail', id] as const,
};

const POLL_MS = 1000;

/** 'mine', or a group's id: that group's runs. */
export type RunScope = 'mine' | { groupId: string };

export function useRunList(scope: RunScope) {
  const query = scope === 'mine' ? 'mine=1' : `groupId=${encodeURIComponent(scope.groupId)}`;
  return useQuery({
    queryKey: runKeys.list(scope),
    queryFn: () => api('GET', `${runPaths.runs}?${query}`, RunList),
    refetchInterval: (q) => (q.state.data?.some((r) => !isFinished(r.status)) ? POLL_MS : false),
  });
}

export function useRun(id: string) {
  return useQuery({
    queryKey: runKeys.detail(id),
    queryFn: () => api('GET', runPaths.run(id), RunDetail),
    refetchInterval: (q) => (q.state.data && isFinished(q.state.data.status) ? false : POLL_MS),
  });
}

export function useStartRun() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: StartRunRequest) => api('POST', runPaths.runs, RunDetail, body),
    onSuccess: (run) => {
      qc.setQueryData(runKeys.detail(run.id), run);
      return qc.invalidateQueries({ queryKey: [...runKeys.all(), 'list'] });
    },
  });
}

export function useCancelRun(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api('POST', runPaths.cancel(id), RunDetail),
    onSuccess: (run) => {
      qc.setQueryData(runKeys.detail(id), run);
      return qc.invalidateQueries({ queryKey: [...runKeys.all(), 'list'] });
    },
  });
}

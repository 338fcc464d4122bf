import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { Notification, NotificationList, UserSettings, notificationPaths } from '@/shared/api/notifications';
import { api } from '@/lib/api';

const notificationKeys = { list: () => ['notifications'] as const, settings: () => ['me', 'settings'] as const };

/** Polled every 30 s while a screen shows it, so the bell stays current without a push channel. */
export function useNotifications() {
  return useQuery({ queryKey: notificationKeys.list(), queryFn: () => api('GET', notificationPaths.list, NotificationList), refetchInterval: 30_000 });
}

export function useMarkRead() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (id: string | null): Promise<void> => {
      if (id) await api('POST', notificationPaths.read(id), Notification);
      else await api('POST', notificationPaths.readAll, null);
    },
    onSuccess: () => qc.invalidateQueries({ queryKey: notificationKeys.list() }),
  });
}

export function useSettings() {
  return useQuery({ queryKey: notificationKeys.settings(), queryFn: () => api('GET', notificationPaths.settings, UserSettings) });
}

export function useSaveSettings() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (s: UserSettings) => api('PUT', notificationPaths.settings, UserSettings, s),
    onSuccess: (s) => qc.setQueryData(notificationKeys.settings(), s),
  });
}

import { useQuery } from '@tanstack/react-query';
import { MeResponse, authPaths } from '@/shared/api/auth';
import { api } from '@/lib/api';
import { useSession } from '@/hooks/useSession';
import { keys } from './keys';

/** The signed-in user, fresh from the server (also confirms the stored token still works). */
export function useMe() {
  const signedIn = useSession((s) => s.status === 'signedIn');
  return useQuery({
    queryKey: keys.me(),
    queryFn: () => api('GET', authPaths.me, MeResponse),
    enabled: signedIn,
  });
}

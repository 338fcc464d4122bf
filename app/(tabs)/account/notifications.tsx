import { useRouter } from 'expo-router';
import { NotificationsPage } from '@/components/account/NotificationsPage';
import { useIsWide } from '@/components/shell/useIsWide';

export default function NotificationsScreen() {
  const router = useRouter();
  const wide = useIsWide();
  return <NotificationsPage onBack={wide ? undefined : () => (router.canGoBack() ? router.back() : router.replace('/account'))} />;
}

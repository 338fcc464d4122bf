// Account: phone = a stack (overview, then a group); wide = overview on the left, group on the right.
import { SplitPane } from '@/components/shell/SplitPane';
import { AccountOverview } from '@/components/account/AccountOverview';

export default function AccountLayout() {
  return <SplitPane list={<AccountOverview />} />;
}

// Feed: phone = a stack (the feed, then a shared sketch); wide = the feed on the left, the sketch on the right.
import { SplitPane } from '@/components/shell/SplitPane';
import { FeedList } from '@/components/feed/FeedList';

export default function FeedLayout() {
  return <SplitPane list={<FeedList />} />;
}

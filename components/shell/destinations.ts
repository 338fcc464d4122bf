// The app's top-level places, in tab order. To add one: add a folder app/(tabs)/<name>/ with a
// _layout.tsx (see TabStack) and an index.tsx, then add an entry here; the bottom tabs and the
// side rail both read this list.
import { AccountIcon, FeedIcon, RunsIcon, SketchesIcon } from './icons';

export const destinations = [
  { name: 'sketches', label: 'Sketches', Icon: SketchesIcon },
  { name: 'feed', label: 'Feed', Icon: FeedIcon },
  { name: 'runs', label: 'Runs', Icon: RunsIcon },
  { name: 'account', label: 'Account', Icon: AccountIcon },
] as const;

export type DestinationName = (typeof destinations)[number]['name'];

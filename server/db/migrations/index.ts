// Every migration, oldest first. A new migration file is added here too (no globbing: the
// same list works under tsx, ts-jest and the TypeORM CLI).
import { Foundation1796145751477 } from './1796145751477-Foundation';
import { Sync1796145952708 } from './1796145952708-Sync';
import { Feed1796146642029 } from './1796146642029-Feed';
import { Runs1796147000000 } from './1796147000000-Runs';
import { SyncCompaction1796148686557 } from './1796148686557-SyncCompaction';
import { AttachmentPhotos1796149446164 } from './1796149446164-AttachmentPhotos';
import { RunSource1796152731904 } from './1796152731904-RunSource';
import { TokenVersion1796239057918 } from './1796239057918-TokenVersion';
import { RunComputeS1796239288889 } from './1796239288889-RunComputeS';
import { FeedSummaries1796239905000 } from './1796239905000-FeedSummaries';
import { RunQueue1796293676583 } from './1796293676583-RunQueue';
import { InvariantKeyByType1796300000000 } from './1796300000000-InvariantKeyByType';

export const migrations = [Foundation1796145751477, Sync1796145952708, Feed1796146642029, Runs1796147000000, SyncCompaction1796148686557,
  AttachmentPhotos1796149446164, RunSource1796152731904, TokenVersion1796239057918, RunComputeS1796239288889,
  FeedSummaries1796239905000, RunQueue1796293676583, InvariantKeyByType1796300000000];

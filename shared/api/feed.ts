// The group feed (docs/product.md journey 4): sharing a sketch to a group, the paged feed, a shared
// sketch's page (photos, fork link, "same invariants as") and forking into my own sketchbook.
import { z } from 'zod';
import { Comment } from './comments';
import { Photo } from './photos';
import { Role } from './groups';
import { Diagram, RecordId, SlateGeometry } from './sketches';
import { normalTag } from './tags';

export const feedPaths = {
  feed: (groupId: string) => `/api/groups/${groupId}/feed`, // GET ?cursor=&tag=&person=&hasResults=
  groupSketch: (groupId: string, sketchId: string) => `/api/groups/${groupId}/feed/${sketchId}`, // GET the sketch page
  share: (sketchId: string) => `/api/sketches/${sketchId}/share`, // PUT {groupId} share, DELETE stop sharing
  fork: (sketchId: string) => `/api/sketches/${sketchId}/fork`, // POST -> 201 ForkResponse
} as const;

export const feedPageSize = 20;

export const FeedQuery = z.object({
  /** The `nextCursor` of the previous page; absent for the first page. */
  cursor: z.coerce.number().int().min(1).optional(),
  /** Matched in normal form (shared/api/tags.ts): "#Torus Knot" finds "torus knot". */
  tag: z.string().max(60).transform(normalTag).pipe(z.string().min(1).max(50)).optional(),
  /** Only sketches owned by this user id. */
  person: z.uuid({ message: 'person must be a user id' }).optional(),
  hasResults: z.enum(['true', 'false']).optional(),
  limit: z.coerce.number().int().min(1).max(50).default(feedPageSize),
});
export type FeedQuery = z.infer<typeof FeedQuery>;

/** The Readout summary the feed shows; jones is null when the PD code is invalid or too large. */
export const InvariantSummary = z.object({
  crossings: z.int(),
  components: z.int().nullable(),
  /** Laurent JSON terms [exponent, coefficient] (shared/poly/laurent.ts), and the same as text. */
  jones: z.array(z.tuple([z.number(), z.union([z.number(), z.string()])])).nullable(),
  jonesText: z.string().nullable(),
  /** The server computes it off the request thread when the sketch is written: not in yet (components and Jones null until then). */
  computing: z.boolean(),
});
export type InvariantSummary = z.infer<typeof InvariantSummary>;

/** The latest finished run of a sketch, when the server has runs. */
export const RunSummary = z.object({
  id: z.string(),
  kind: z.string(),
  finishedAt: z.string(),
  summary: z.string(),
  /** The s-invariant over Q, when a finished run of the sketch computed it (this one or an earlier one). */
  s: z.int().optional(),
});
export type RunSummary = z.infer<typeof RunSummary>;

export const Person = z.object({ id: z.string(), displayName: z.string() });
export type Person = z.infer<typeof Person>;

/**
 * What the feed draws a sketch from, as the Slate does (gaps at crossings, colours, framings):
 * its code and framings, and its drawing when it was drawn on the Slate, each strand thinned to
 * what a picture needs (null: typed or from an older app; then it is laid out from the code).
 */
export const FeedDiagram = Diagram.omit({ strokes: true, geometry: true }).extend({ geometry: SlateGeometry.nullable() });
export type FeedDiagram = z.infer<typeof FeedDiagram>;

export const FeedItem = z.object({
  id: RecordId,
  groupId: z.string(),
  title: z.string(),
  tags: z.array(z.string()),
  owner: Person,
  updatedAt: z.string(),
  diagram: FeedDiagram,
  /** Signed thumbnail URL of the first board photo, if any. */
  photoThumbUrl: z.string().nullable(),
  invariants: InvariantSummary,
  latestRun: RunSummary.nullable(),
  commentCount: z.int(),
  /** The sketch version this item shows (also the paging key). */
  version: z.int(),
});
export type FeedItem = z.infer<typeof FeedItem>;

export const FeedPage = z.object({ items: z.array(FeedItem), nextCursor: z.int().nullable() });
export type FeedPage = z.infer<typeof FeedPage>;

export const SketchRef = z.object({ id: RecordId, title: z.string(), owner: Person });
export type SketchRef = z.infer<typeof SketchRef>;

/** What the caller may do on this page (the server checks again on every request). */
export const GroupSketchAbilities = z.object({
  comment: z.boolean(),
  moderate: z.boolean(),
  uploadPhoto: z.boolean(),
  fork: z.boolean(),
  unshare: z.boolean(),
});

export const GroupSketch = FeedItem.extend({
  seenAt: z.string(),
  notes: z.string(),
  photos: z.array(Photo),
  comments: z.array(Comment),
  /** The sketch this one was forked from, when the caller may still see it. */
  forkedFrom: SketchRef.nullable(),
  /** Other sketches in this group with the same knot-type invariants or Khovanov result (the first ten). */
  sameInvariants: z.array(SketchRef),
  /** How many such sketches there are in all. */
  sameInvariantsTotal: z.int(),
  myRole: Role,
  can: GroupSketchAbilities,
});
export type GroupSketch = z.infer<typeof GroupSketch>;

export const ShareRequest = z.object({ groupId: z.uuid({ message: 'Choose a group to share to' }) });
export type ShareRequest = z.infer<typeof ShareRequest>;
/** PUT / DELETE share -> 200: the sketch's sharing after the change. */
export const ShareResponse = z.object({ id: RecordId, groupId: z.string().nullable(), version: z.int() });
export type ShareResponse = z.infer<typeof ShareResponse>;

/** POST fork -> 201: the new private sketch in the caller's sketchbook (arrives on devices by sync). */
export const ForkResponse = z.object({ id: RecordId, forkedFrom: RecordId, version: z.int() });
export type ForkResponse = z.infer<typeof ForkResponse>;

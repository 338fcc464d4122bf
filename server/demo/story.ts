// The demo's story (invented talks, invented people): sketches the seminar shared to its feed,
// a short discussion under some of them, and heavy runs started on them (computed by the run
// pool once the server is up). Each sketch has a fixed id and is added only while absent, so a
// second start adds nothing twice, and a sketch someone deleted in the demo stays deleted.
import { randomUUID } from 'node:crypto';
import type { User } from '@/shared/api/auth';
import type { Diagram as StoredDiagram } from '@/shared/api/sketches';
import { canPost } from '@/shared/api/feed-rules';
import { StartRunRequest } from '@/shared/api/runs';
import { fromBraid } from '@/shared/knot/braid';
import type { Diagram } from '@/shared/knot/diagram';
import { pretzelLink, torusLink, twistKnot } from '@/shared/knot/families';
import { layoutPD, layoutToSketch } from '@/shared/layout';
import { findUserById } from '../auth/repository';
import { insertComment } from '../comments/repository';
import { inTransaction } from '../db/transaction';
import type { Deps } from '../deps';
import { findMembership } from '../groups/repository';
import { findSketch } from '../sketches/repository';
import { push } from '../sync/use-cases';
import { startRun } from '../runs/use-cases';

export type Person = 'ilse' | 'tomas' | 'priya' | 'jonah';

interface StorySketch {
  id: string;
  owner: Person;
  /** Days before the seed ran, so the feed reads as a few weeks of a seminar. */
  daysAgo: number;
  title: string;
  seenAt: string;
  notes: string;
  tags: string[];
  diagram: () => Diagram;
  comments: { by: Person; hoursLater: number; body: string }[];
  runs: { by: Person; ring: 'Z' | 'Q' | 'F2'; sweep?: number }[];
}

export const DEMO_SKETCHES: StorySketch[] = [
  {
    id: 'demo-sketch-trefoil-opening',
    owner: 'ilse',
    daysAgo: 20,
    title: 'Trefoil from the opening slide',
    seenAt: 'Reading seminar, week 1: "Categorifying the bracket", T. Okafor',
    notes: 'The warm-up example. Tomás drew it as the closure of a positive 2-braid.',
    tags: ['warm-up', 'torus knot'],
    diagram: () => fromBraid([1, 1, 1]),
    comments: [
      { by: 'tomas', hoursLater: 3, body: 'Right-handed, as on the slide: the Readout agrees with the sign convention we fixed in week 1.' },
      { by: 'priya', hoursLater: 5, body: 'The run finished over **Z**: one torsion group, as promised in the talk. Is it worth doing `F2` too?' },
      { by: 'ilse', hoursLater: 26, body: 'Yes, next week, to compare with the reduced version.' },
    ],
    runs: [{ by: 'ilse', ring: 'Z' }],
  },
  {
    id: 'demo-sketch-figure-eight',
    owner: 'priya',
    daysAgo: 13,
    title: 'Figure-eight, drawn as a twist knot',
    seenAt: 'Reading seminar, week 2: "Amphichirality and the Jones polynomial", P. Lindqvist',
    notes: 'Drawn twice on the board, once as a twist knot and once as a 3-braid. Both give the same Readout.',
    tags: ['amphichiral', 'twist knot'],
    diagram: () => twistKnot(2),
    comments: [
      { by: 'jonah', hoursLater: 2, body: 'The table of the run is symmetric under (i, j) -> (-i, -j), as it must be for an amphichiral knot.' },
    ],
    runs: [{ by: 'priya', ring: 'Q' }],
  },
  {
    id: 'demo-sketch-trefoil-handles',
    owner: 'jonah',
    daysAgo: 8,
    title: 'Trefoil for the handle-attachment example',
    seenAt: 'Reading seminar, week 3: "Cables and 2-handles", J. Abernethy',
    notes: 'Blackboard framing. The sweep over cables is what the argument in the talk needs.',
    tags: ['torus knot', 'cables'],
    diagram: () => torusLink(2, 3),
    comments: [
      { by: 'ilse', hoursLater: 1, body: 'Same invariants as the trefoil from week 1, so the feed links the two.' },
      { by: 'tomas', hoursLater: 20, body: 'I started a cable sweep up to two strands; the grid is on the run page.' },
    ],
    runs: [{ by: 'tomas', ring: 'Z', sweep: 2 }],
  },
  {
    id: 'demo-sketch-hopf-framed',
    owner: 'tomas',
    daysAgo: 4,
    title: 'Hopf link, both components 0-framed',
    seenAt: 'Coffee after week 3, napkin',
    notes: 'Surgery on this gives the 3-sphere back; worth keeping next to the cables.',
    tags: ['link', 'surgery'],
    diagram: () => ({ ...torusLink(2, 2), framings: [0, 0] }),
    comments: [],
    runs: [{ by: 'tomas', ring: 'F2' }],
  },
  {
    id: 'demo-sketch-pretzel',
    owner: 'priya',
    daysAgo: 1,
    title: 'Pretzel (-2, 3, 7) from the guest talk',
    seenAt: 'Guest talk: "Exotic surgeries on pretzel knots", visiting speaker',
    notes: 'Twelve crossings: left for a run on the server.',
    tags: ['pretzel'],
    diagram: () => pretzelLink([-2, 3, 7]),
    comments: [
      { by: 'jonah', hoursLater: 4, body: 'Could someone with a laptop start a run on this one? My phone is at its limit.' },
    ],
    runs: [],
  },
];

const round = (x: number) => Math.round(x * 10) / 10;

/** The stored diagram, with the laid-out drawing as its strokes and geometry, as the Slate stores it. */
function stored(d: Diagram): StoredDiagram {
  const sketch = layoutToSketch(layoutPD(d.pd, d.unknots), d.framings);
  return {
    pd: d.pd.map((x) => [...x] as [number, number, number, number]),
    unknots: d.unknots,
    framings: [...d.framings],
    strokes: sketch.components.map((c) => ({ points: c.points.map((p) => [round(p.x), round(p.y)] as [number, number]), closed: c.closed })),
    geometry: { components: sketch.components, flips: sketch.flips, nextSeq: sketch.nextSeq },
  };
}

const HOUR = 3600 * 1000;

/**
 * Adds the sketches that are absent (and their comments and runs); returns rows added. People
 * (user ids) who left the group or became viewers have their part of the story left out.
 */
export async function seedStory(deps: Deps, groupId: string, people: Record<Person, string>): Promise<number> {
  const users = new Map<Person, User>();
  for (const [p, id] of Object.entries(people) as [Person, string][]) {
    const u = await findUserById(deps.db, id);
    const m = u && (await findMembership(deps.db, groupId, id));
    if (u && m && canPost(m.role)) users.set(p, { id: u.id, email: u.email, displayName: u.displayName });
  }
  let added = 0;
  for (const s of DEMO_SKETCHES) {
    const owner = users.get(s.owner);
    if (!owner || (await findSketch(deps.db, s.id))) continue;
    const at = new Date(deps.now().getTime() - s.daysAgo * 24 * HOUR);
    const fields = {
      title: s.title, seenAt: s.seenAt, notes: s.notes, tags: s.tags, diagram: stored(s.diagram()), attachments: [],
      createdAt: at.toISOString(), updatedAt: at.toISOString(), groupId, deleted: false,
    };
    const deviceId = 'demo-seed';
    // Pushed as of that day, so the feed's "when" reads as the seminar's weeks.
    await push({ ...deps, now: () => at }, owner, { deviceId, mutations: [{ mutationId: randomUUID(), deviceId, clock: 1, recordId: s.id, type: 'sketch', op: 'add', baseVersion: 0, fields }] });
    added++;
    const comments = s.comments.filter((c) => users.has(c.by));
    await inTransaction(deps.db, async (m) => {
      for (const c of comments) {
        const createdAt = new Date(at.getTime() + c.hoursLater * HOUR);
        await insertComment(m, { id: randomUUID(), sketchId: s.id, groupId, authorId: users.get(c.by)!.id, body: c.body, createdAt, editedAt: null });
      }
    });
    added += comments.length;
    for (const r of s.runs) {
      const by = users.get(r.by);
      if (!by) continue;
      const kind = r.sweep ? 'cable-sweep' : 'khovanov';
      await startRun(deps, by, StartRunRequest.parse({ kind, sketchId: s.id, ring: r.ring, ...(r.sweep && { sweep: { maxStrands: r.sweep } }) }));
      added++;
    }
  }
  return added;
}

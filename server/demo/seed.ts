// The demo scenario (invented people at an invented university): one seminar group with an
// owner, an admin, two members and a viewer, and its story (story.ts): shared sketches,
// comments, runs. Safe to run on every start.
import bcrypt from 'bcryptjs';
import type { Role } from '@/shared/api/groups';
import { findUserByEmail, insertUser } from '../auth/repository';
import { inTransaction } from '../db/transaction';
import type { Deps } from '../deps';
import { addMembership, findGroup } from '../groups/repository';
import { Group } from '../db/entities';
import { seedStory } from './story';

export const DEMO_GROUP = {
  id: '4f6c2a9e-1d3b-4c8e-9a7f-0b5d3e2c1a60',
  name: 'Low-Dimensional Topology Reading Seminar, Harrowgate University',
};

export const DEMO_USERS: { id: string; email: string; displayName: string; password: string; role: Role }[] = [
  { id: '0a1e5c3d-7b2f-4e6a-8c9d-1f2e3a4b5c01', email: 'ilse.marchetti@harrowgate.example', displayName: 'Ilse Marchetti', password: 'demo-owner-1', role: 'owner' },
  { id: '0a1e5c3d-7b2f-4e6a-8c9d-1f2e3a4b5c02', email: 'tomas.okafor@harrowgate.example', displayName: 'Tomás Okafor', password: 'demo-admin-1', role: 'admin' },
  { id: '0a1e5c3d-7b2f-4e6a-8c9d-1f2e3a4b5c03', email: 'priya.lindqvist@harrowgate.example', displayName: 'Priya Lindqvist', password: 'demo-member-1', role: 'member' },
  { id: '0a1e5c3d-7b2f-4e6a-8c9d-1f2e3a4b5c04', email: 'jonah.abernethy@harrowgate.example', displayName: 'Jonah Abernethy', password: 'demo-member-2', role: 'member' },
  { id: '0a1e5c3d-7b2f-4e6a-8c9d-1f2e3a4b5c05', email: 'wen.hallberg@harrowgate.example', displayName: 'Wen Hallberg', password: 'demo-viewer-1', role: 'viewer' },
];

/**
 * Seeds the scenario once: when the demo group exists its people are not touched, so what
 * people do in the demo (roles changed, members removed) survives restarts; the story adds
 * only the sketches that were never added. Returns rows added.
 */
export async function seedDemo(deps: Deps): Promise<number> {
  const people = await seedPeople(deps);
  const [ilse, tomas, priya, jonah] = DEMO_USERS.map((u) => u.id);
  return people + (await seedStory(deps, DEMO_GROUP.id, { ilse, tomas, priya, jonah }));
}

async function seedPeople({ db, config }: Deps): Promise<number> {
  if (await findGroup(db, DEMO_GROUP.id)) return 0;
  const hashes = await Promise.all(DEMO_USERS.map((u) => bcrypt.hash(u.password, config.bcryptRounds)));
  return inTransaction(db, async (m) => {
    if (await findGroup(m, DEMO_GROUP.id)) return 0;
    await m.getRepository(Group).insert(DEMO_GROUP);
    let added = 1;
    for (const [k, u] of DEMO_USERS.entries()) {
      let user = await findUserByEmail(m, u.email);
      if (!user) {
        user = await insertUser(m, { id: u.id, email: u.email, displayName: u.displayName, passwordHash: hashes[k] });
        added++;
      }
      await addMembership(m, DEMO_GROUP.id, user.id, u.role);
      added++;
    }
    return added;
  });
}

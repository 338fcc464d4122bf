// Server side of S13, S14, S18, S19, S19a, S20: apply one mutation to the stored record.
// Field-level merge keyed on who wrote each field's current value (a per-field
// last-writer register, the state-based LWW register of Shapiro et al., "Conflict-free
// Replicated Data Types", 2011, ordered here by the server's sequence instead of clocks).
import type { Fields, Mutation, Writer } from '@/shared/api/sync';
import { jsonEqual } from './equal';
import type { TypePolicy } from './policy';

export interface StoredState {
  fields: Fields;
  /** Writer of each field's current value; absent for a default never written. */
  writers: Record<string, Writer>;
  version: number;
}

export interface ConflictCopy {
  losing: Fields;
  winning: Fields;
  losingWriter: Writer;
  winningWriter: Writer;
}

export interface MergeOutcome {
  state: StoredState;
  /** False when nothing changed: the mutation gets no seq (S9). */
  changed: boolean;
  conflict: ConflictCopy | null;
}

const time = (v: unknown): number => (typeof v === 'string' ? Date.parse(v) : NaN);

/** The field names whose values the device had not seen: written by another device after base. */
function unseen(state: StoredState, m: Mutation): string[] {
  return Object.entries(state.writers)
    .filter(([, w]) => w.deviceId !== m.deviceId && w.seq > m.baseVersion)
    .map(([f]) => f);
}

const latestWriter = (ws: Writer[]): Writer => ws.reduce((a, b) => (b.seq > a.seq ? b : a));

/**
 * `seq` is the sequence number this mutation gets if it changes anything; `now` fills the
 * defaults of a record first seen through an update (S13).
 */
export function mergeMutation(
  current: StoredState | null,
  m: Mutation,
  seq: number,
  policy: TypePolicy,
  now: string,
): MergeOutcome {
  const created = current === null;
  const base: StoredState = current ?? { fields: policy.defaults(now), writers: {}, version: 0 };
  const fields: Fields = { ...base.fields };
  const writers: Record<string, Writer> = { ...base.writers };
  const me: Writer = { deviceId: m.deviceId, clock: m.clock, seq };
  const losing: Fields = {};
  const winning: Fields = {};
  const losers: Writer[] = [];
  let changed = created;

  for (const [f, value] of Object.entries(m.fields)) {
    if (value === undefined) continue;
    const w = base.writers[f];
    if (w && w.deviceId === m.deviceId && w.clock > m.clock) continue; // S14
    const old = base.fields[f];
    if (jsonEqual(old, value)) {
      if (created) writers[f] = me; // a new record's writer owns even the values equal to defaults
      continue;
    }
    if (policy.latest.includes(f) && time(old) >= time(value)) continue; // S19
    if (w && w.deviceId !== m.deviceId && w.seq > m.baseVersion && !policy.latest.includes(f)) {
      losing[f] = old; // S18: same field, both changed
      winning[f] = value;
      losers.push(w);
    }
    fields[f] = value;
    writers[f] = me;
    changed = true;
  }

  if (m.op === 'delete' && !created) {
    const edits = unseen(base, m).filter((f) => f !== 'deleted' && !policy.latest.includes(f));
    if (edits.length > 0 && fields.deleted === true && base.fields.deleted !== true) {
      losing.deleted = false; // S19a: keep the edits the delete had not seen
      winning.deleted = true;
      for (const f of edits) losing[f] = base.fields[f];
      losers.push(...edits.map((f) => base.writers[f]));
    }
  }

  const conflict = losers.length > 0 ? { losing, winning, losingWriter: latestWriter(losers), winningWriter: me } : null;
  return {
    state: { fields, writers, version: changed ? seq : base.version },
    changed,
    conflict,
  };
}

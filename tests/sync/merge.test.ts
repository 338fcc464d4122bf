// Server-side merge of one mutation (sync/SPEC.md S13, S14, S18, S19, S19a, S20).
import fc from 'fast-check';
import { mergeMutation, type StoredState } from '@/sync/merge';
import { policies } from '@/sync/policy';
import type { Fields, Mutation } from '@/shared/api/sync';

const now = '2026-12-01T10:00:00.000Z';
const sketch = policies.sketch;
let n = 0;
const mut = (deviceId: string, clock: number, baseVersion: number, fields: Fields, op: Mutation['op'] = 'update'): Mutation => ({
  mutationId: `00000000-0000-4000-8000-${String(++n).padStart(12, '0')}`,
  deviceId,
  clock,
  recordId: 'r1',
  type: 'sketch',
  op,
  baseVersion,
  fields: op === 'delete' ? { ...fields, deleted: true } : { ...fields, deleted: false },
});
const apply = (s: StoredState | null, m: Mutation, seq: number) => mergeMutation(s, m, seq, sketch, now);

describe('mergeMutation', () => {
  test('S13: an update before its add creates the record from defaults; the add then merges', () => {
    const upd = apply(null, mut('A', 2, 0, { title: 'late title' }), 1);
    expect(upd.changed).toBe(true);
    expect(upd.state.fields.title).toBe('late title');
    expect(upd.state.fields.notes).toBe('');
    const add = apply(upd.state, mut('A', 1, 0, { title: 'first', notes: 'n' }, 'add'), 2);
    expect(add.state.fields.title).toBe('late title'); // S14: the older write of A is skipped
    expect(add.state.fields.notes).toBe('n');
    expect(add.conflict).toBeNull();
  });

  test('S9: a mutation that changes nothing keeps the version and gets no seq', () => {
    const a = apply(null, mut('A', 1, 0, { title: 't' }, 'add'), 1);
    const again = apply(a.state, mut('A', 2, 1, { title: 't' }), 2);
    expect(again.changed).toBe(false);
    expect(again.state.version).toBe(1);
  });

  test('S18: different fields changed on two devices both stay, no conflict copy', () => {
    const a = apply(null, mut('A', 1, 0, { title: 't', notes: '' }, 'add'), 1);
    const b1 = apply(a.state, mut('A', 2, 1, { title: 'from A' }), 2);
    const b2 = apply(b1.state, mut('B', 1, 1, { notes: 'from B' }), 3);
    expect(b2.state.fields).toMatchObject({ title: 'from A', notes: 'from B' });
    expect(b2.conflict).toBeNull();
  });

  test('S19, S20: same field changed on two devices: later server order wins, loser kept', () => {
    const a = apply(null, mut('A', 1, 0, { title: 't' }, 'add'), 1);
    const fromA = apply(a.state, mut('A', 2, 1, { title: 'A says' }), 2);
    const fromB = apply(fromA.state, mut('B', 1, 1, { title: 'B says' }), 3);
    expect(fromB.state.fields.title).toBe('B says');
    expect(fromB.conflict).toEqual({
      losing: { title: 'A says' },
      winning: { title: 'B says' },
      losingWriter: { deviceId: 'A', clock: 2, seq: 2 },
      winningWriter: { deviceId: 'B', clock: 1, seq: 3 },
    });
  });

  test('S18: a device that had seen the other write is not in conflict', () => {
    const a = apply(null, mut('A', 1, 0, { title: 't' }, 'add'), 1);
    const fromA = apply(a.state, mut('A', 2, 1, { title: 'A says' }), 2);
    const fromB = apply(fromA.state, mut('B', 1, 2, { title: 'B says' }), 3);
    expect(fromB.conflict).toBeNull();
  });

  test('S19: updatedAt keeps the latest time and never conflicts', () => {
    const a = apply(null, mut('A', 1, 0, { updatedAt: '2026-12-01T10:05:00Z' }, 'add'), 1);
    const b = apply(a.state, mut('B', 1, 0, { updatedAt: '2026-12-01T10:01:00.500Z', notes: 'x' }), 2);
    expect(b.state.fields.updatedAt).toBe('2026-12-01T10:05:00Z');
    expect(b.conflict).toBeNull();
  });

  test('S19a: a delete that meets unseen edits deletes and keeps the edits as a conflict copy', () => {
    const a = apply(null, mut('A', 1, 0, { title: 't' }, 'add'), 1);
    const edit = apply(a.state, mut('A', 2, 1, { notes: 'kept?' }), 2);
    const del = apply(edit.state, mut('B', 1, 1, {}, 'delete'), 3);
    expect(del.state.fields.deleted).toBe(true);
    expect(del.state.fields.notes).toBe('kept?'); // S4: the tombstone keeps content
    expect(del.conflict?.losing).toEqual({ deleted: false, notes: 'kept?' });
  });

  test('S19a: an update that meets an unseen delete undeletes, the delete kept as conflict', () => {
    const a = apply(null, mut('A', 1, 0, { title: 't' }, 'add'), 1);
    const del = apply(a.state, mut('B', 1, 1, {}, 'delete'), 2);
    const edit = apply(del.state, mut('A', 2, 1, { notes: 'still here' }), 3);
    expect(edit.state.fields.deleted).toBe(false);
    expect(edit.conflict?.losing).toEqual({ deleted: true });
  });

  // S18-S20 "nothing dropped": whatever two devices write in whatever server order, every
  // value written that changed the record (S9: a write of the value already there is none) is either the field's final value, or in a conflict copy's losing values,
  // or was knowingly replaced: by a later write of the same device (S14) or by a write whose
  // device had seen it (its base version at or past the value's seq).
  test('S18-S20: property: no written value is lost', () => {
    const write = fc.record({
      dev: fc.constantFrom('A', 'B'),
      field: fc.constantFrom('title', 'notes', 'seenAt'),
      value: fc.string({ maxLength: 3 }),
      seen: fc.boolean(),
    });
    fc.assert(
      fc.property(fc.array(write, { minLength: 1, maxLength: 12 }), (writes) => {
        let state: StoredState | null = null;
        const clocks: Record<string, number> = { A: 0, B: 0 };
        const lastSeen: Record<string, number> = { A: 0, B: 0 };
        const losing: { field: string; value: unknown }[] = [];
        const ok: { dev: string; clock: number; seq: number; base: number; field: string; value: string }[] = [];
        writes.forEach((w, i) => {
          const clock = ++clocks[w.dev];
          if (w.seen && state) lastSeen[w.dev] = state.version;
          const m = mut(w.dev, clock, lastSeen[w.dev], { [w.field]: w.value });
          const out = apply(state, m, i + 1);
          state = out.state;
          for (const [f, v] of Object.entries(out.conflict?.losing ?? {})) losing.push({ field: f, value: v });
          if (out.changed) ok.push({ dev: w.dev, clock, seq: i + 1, base: m.baseVersion, field: w.field, value: w.value });
        });
        const final = state as unknown as StoredState;
        for (const w of ok) {
          const replaced = ok.some(
            (o) => o.field === w.field && o.seq > w.seq && (o.dev === w.dev || o.base >= w.seq),
          );
          const kept =
            final.fields[w.field] === w.value ||
            losing.some((l) => l.field === w.field && l.value === w.value) ||
            replaced;
          expect(kept).toBe(true);
        }
      }),
    );
  });
});

// The Runs tab's table, compact enough for a phone or the wide list pane: status with its
// progress, diagram, ring (and reduced), start date, time, newest first. Headers sort (press
// again to reverse); the filter matches what the rows show (label, ring with "reduced", status,
// kind, date). Short cells stay on one line, never cut inside a word. The open run is marked.
import { useState } from 'react';
import { Pressable, StyleSheet, Text, TextInput, View } from 'react-native';
import { Link } from 'expo-router';
import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type SortingState,
} from '@tanstack/react-table';
import type { RunKind, RunSummary } from '@/shared/api/runs';
import { runPagePath } from '@/shared/api/runs';
import { colors, fonts, radius, space, type } from '@/constants/theme';
import { useFilterShortcut } from '@/components/shell/shortcuts';
import { ProgressBar } from './ProgressBar';
import { duration, ringLabel, runDate, statusLabel } from '@/lib/run-format';

const col = createColumnHelper<RunSummary>();

/** How the table names each kind (the filter matches these words). */
const kindName: Record<RunKind, string> = { khovanov: 'khovanov', 'cable-sweep': 'cable sweep', bands: 'bands' };

const columns = [
  col.accessor('status', {
    header: 'Status',
    cell: (c) => (
      <View style={styles.status}>
        <Text style={styles.cell} numberOfLines={1}>{statusLabel[c.getValue()]}</Text>
        <ProgressBar fraction={c.row.original.progress.fraction} status={c.getValue()} label={`Progress of ${c.row.original.label}`} />
      </View>
    ),
  }),
  col.accessor('label', {
    header: 'Diagram',
    cell: (c) => (
      <Link href={runPagePath(c.row.original.id)} style={[styles.link, !c.row.original.sketchId && styles.linkCode]} numberOfLines={2}>
        {c.getValue()}
        <Text style={styles.muted}>{`  ${c.row.original.kind === 'khovanov' ? '' : `${kindName[c.row.original.kind]} · `}${c.row.original.crossings} crossings`}</Text>
      </Link>
    ),
  }),
  col.accessor((r) => ringLabel(r), { id: 'ring', header: 'Ring', cell: (c) => <Text style={styles.code}>{c.getValue()}</Text> }),
  col.accessor('createdAt', { header: 'Started', cell: (c) => <Text style={styles.cell}>{runDate(c.getValue(), true)}</Text> }),
  col.accessor((r) => (r.startedAt ? (r.finishedAt ? Date.parse(r.finishedAt) : Date.now()) - Date.parse(r.startedAt) : -1), {
    id: 'time',
    header: 'Time',
    cell: (c) => <Text style={styles.cell} numberOfLines={1}>{duration(c.row.original)}</Text>,
  }),
];

// Ring is short ("Z", "F7, reduced" wraps); Time needs "847 ms" on one line in the wide list pane.
const widths: Record<string, number> = { status: 1.1, label: 2.3, ring: 0.7, createdAt: 1, time: 1.1 };

/** What the filter looks in: the words each row shows. */
const searchText = (r: RunSummary) =>
  [r.label, ringLabel(r), statusLabel[r.status], kindName[r.kind], runDate(r.createdAt, true), r.source ?? ''].join(' ').toLowerCase();

export function RunsTable({ runs, openId }: { runs: RunSummary[]; openId?: string }) {
  const [sorting, setSorting] = useState<SortingState>([{ id: 'createdAt', desc: true }]);
  const [filter, setFilter] = useState('');
  const filterField = useFilterShortcut('Runs', 'Filter runs');
  const table = useReactTable({
    data: runs,
    columns,
    state: { sorting, globalFilter: filter },
    onSortingChange: setSorting,
    onGlobalFilterChange: setFilter,
    globalFilterFn: (row, _id, value: string) => searchText(row.original).includes(value.trim().toLowerCase()),
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });
  return (
    <View style={styles.wrap}>
      <TextInput
        ref={filterField}
        value={filter}
        onChangeText={setFilter}
        placeholder="Filter by diagram, ring, reduced, status or date"
        placeholderTextColor={colors.inkFaint}
        aria-label="Filter runs"
        style={styles.filter}
      />
      <View role="table" aria-label="Runs">
        {table.getHeaderGroups().map((hg) => (
          <View role="row" key={hg.id} style={[styles.row, styles.headRow]}>
            {hg.headers.map((h) => {
              const dir = h.column.getIsSorted();
              return (
                <Pressable key={h.id} role="columnheader" aria-sort={dir === 'asc' ? 'ascending' : dir === 'desc' ? 'descending' : 'none'}
                  onPress={h.column.getToggleSortingHandler()} style={{ flex: widths[h.column.id] ?? 1 }}>
                  <Text style={styles.head}>
                    {flexRender(h.column.columnDef.header, h.getContext())}
                    {dir === 'asc' ? ' ↑' : dir === 'desc' ? ' ↓' : ''}
                  </Text>
                </Pressable>
              );
            })}
          </View>
        ))}
        {table.getRowModel().rows.map((row) => (
          <View role="row" key={row.id} style={[styles.row, row.original.id === openId && styles.open]} aria-current={row.original.id === openId || undefined} testID={`run-row-${row.original.id}`}>
            {row.getVisibleCells().map((c) => (
              <View role="cell" key={c.id} style={[styles.cellBox, { flex: widths[c.column.id] ?? 1 }]}>
                {flexRender(c.column.columnDef.cell, c.getContext())}
              </View>
            ))}
          </View>
        ))}
        {table.getRowModel().rows.length === 0 ? <Text style={styles.muted}>No run matches “{filter}”.</Text> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  filter: { ...type.small, borderWidth: 1, borderColor: colors.line, borderRadius: radius.sm, paddingHorizontal: space.md, paddingVertical: space.sm, backgroundColor: colors.surface, color: colors.ink },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm, paddingVertical: space.sm, borderBottomWidth: 1, borderBottomColor: colors.line },
  headRow: { borderBottomColor: colors.ink },
  open: { backgroundColor: colors.accentSoft },
  head: { ...type.label, color: colors.inkMuted },
  cellBox: { justifyContent: 'center', minWidth: 0 },
  status: { gap: space.xs },
  cell: { ...type.small, color: colors.ink },
  code: { fontFamily: fonts.mono, fontSize: 13, color: colors.ink },
  link: { ...type.small, color: colors.accent, fontFamily: fonts.medium },
  // A pasted code (no sketch) is a code: monospace, like everywhere else.
  linkCode: { fontFamily: fonts.monoMedium, fontSize: 13 },
  muted: { ...type.small, color: colors.inkFaint, fontFamily: fonts.regular },
});

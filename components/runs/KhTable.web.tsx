// Web: the bigraded Khovanov table as an HTML table, i across and j down (largest j on top).
// Columns take the width of their content; the i and j labels stay in view while the table
// scrolls (CSS sticky); when the table is larger than its box, a line says so and how to see
// the rest (scroll, or the run page's Focus button where it has one).
import { useEffect, useRef, useState, type CSSProperties } from 'react';
import type { KhGroupJson } from '@/shared/api/runs';
import { grid, groupText } from '@/shared/khovanov/format';
import { TeX } from '@/components/ui/Math';
import { colors, fonts, space, type } from '@/constants/theme';

/** Whether the table is cut on the right or at the bottom, kept up to date as the box resizes. */
function useCut(box: React.RefObject<HTMLDivElement | null>) {
  const [cut, setCut] = useState({ across: false, down: false });
  useEffect(() => {
    const el = box.current;
    if (!el) return;
    const measure = () => setCut({ across: el.scrollWidth > el.clientWidth + 1, down: el.scrollHeight > el.clientHeight + 1 });
    const observer = new ResizeObserver(measure);
    observer.observe(el);
    if (el.firstElementChild) observer.observe(el.firstElementChild);
    measure();
    return () => observer.disconnect();
  }, [box]);
  return cut;
}

/** `focusable`: the page has its Focus button (wide run pages), so the note may point to it. */
export function KhTable({ groups, ring, compact = false, label, focusable = false }: { groups: KhGroupJson[]; ring: string; compact?: boolean; label: string; focusable?: boolean }) {
  const box = useRef<HTMLDivElement>(null);
  const cut = useCut(box);
  const g = grid(groups);
  if (g.is.length === 0) return <span style={{ ...type.small, color: colors.inkFaint }}>All groups are zero.</span>;
  const size = compact ? 11 : 14;
  const cell: CSSProperties = { padding: compact ? '2px 4px' : `${space.xs}px ${space.sm}px`, border: `1px solid ${colors.line}`, textAlign: 'center', whiteSpace: 'nowrap', fontSize: size, minWidth: compact ? 18 : 28 };
  const head: CSSProperties = { ...cell, fontFamily: fonts.mono, fontWeight: 'normal', color: colors.inkMuted, background: colors.sunken, position: 'sticky' };
  const shown = cut.across || cut.down;
  return (
    <div style={{ display: 'flex', flexDirection: 'column', gap: space.xs, maxWidth: '100%' }}>
      <div ref={box} style={{ overflow: 'auto', maxWidth: '100%', maxHeight: compact ? '50vh' : '75vh' }}>
        <table aria-label={label} style={{ borderCollapse: 'separate', borderSpacing: 0 }}>
          <thead>
            <tr>
              <th scope="col" style={{ ...head, top: 0, left: 0, zIndex: 2, color: colors.inkFaint }}>{'j \\ i'}</th>
              {g.is.map((i) => (
                <th key={i} scope="col" style={{ ...head, top: 0, zIndex: 1 }}>{i}</th>
              ))}
            </tr>
          </thead>
          <tbody>
            {g.js.map((j) => (
              <tr key={j}>
                <th scope="row" style={{ ...head, left: 0, zIndex: 1 }}>{j}</th>
                {g.is.map((i) => {
                  const x = g.at(i, j);
                  return (
                    <td key={i} style={{ ...cell, background: x ? colors.surface : undefined }}>
                      {x ? <TeX tex={groupText(x, ring, 'tex')} text={groupText(x, ring)} nowrap /> : null}
                    </td>
                  );
                })}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {shown ? (
        <span role="note" style={{ ...type.small, color: colors.accent }}>
          {`Larger than this view (i = ${g.is[0]} to ${g.is[g.is.length - 1]}, ${g.is.length} columns; j = ${g.js[g.js.length - 1]} to ${g.js[0]}): scroll the table${focusable ? ', or use Focus above for the whole width' : ''}.`}
        </span>
      ) : null}
    </div>
  );
}

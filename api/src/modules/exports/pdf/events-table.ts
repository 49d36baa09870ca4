import { clockFromArrest, type Debrief } from '@upstroke/contracts';
import { entryRows } from './entry-rows';
import { colors, type Layout } from './layout';

/**
 * Every entry of the record in time order: events and typed EtCO2 values. What a correction
 * replaced or Undo took back is printed struck through with its status, never left out.
 */
export function drawEvents(l: Layout, d: Debrief): void {
  const rows = entryRows(d, (iso) => l.clock(iso), d.record.etco2Unit);
  const values = d.etco2Entries.length;
  l.heading(
    `Entries in time order (${d.events.length} events${values ? `, ${values} typed EtCO2 values` : ''})`,
  );
  const cols = [
    { title: 'From arrest', w: 58 },
    { title: 'Clock', w: 52 },
    { title: 'Entry', w: 80 },
    { title: 'Details', w: l.width - 58 - 52 - 80 - 96 },
    { title: 'Status', w: 96 },
  ];
  const header = () => {
    let x = l.left;
    const y = l.doc.y;
    for (const c of cols) {
      l.text(c.title, x, y, { size: 7.5, weight: 700, color: colors.muted });
      x += c.w;
    }
    l.doc.y = y + 12;
  };
  header();
  for (const r of rows) {
    const cells = [`+${clockFromArrest(r.tSec)}`, l.clock(r.at), r.what, r.details, r.status];
    const h = Math.max(...cells.map((c, i) => l.height(c, cols[i].w - 6, 8.5))) + 3;
    if (l.doc.y + h > l.bottom) {
      l.ensure(h + 20);
      header();
    }
    const y = l.doc.y;
    let x = l.left;
    cells.forEach((c, i) => {
      // The status stays legible: it says why the entry is struck through.
      const struck = r.struck && i < 4;
      l.text(c, x, y, {
        size: 8.5,
        width: cols[i].w - 6,
        color: struck ? colors.muted : colors.ink,
        strike: struck,
        weight: (r.amendment || r.struck) && i === 4 ? 700 : 400,
      });
      x += cols[i].w;
    });
    l.doc.y = y + h;
  }
}

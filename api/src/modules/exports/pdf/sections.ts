import {
  ageGroupLabels,
  clockFromArrest,
  confounderLabels,
  type Debrief,
  findingKindLabels,
  outcomeLabels,
  rhythmName,
  rosterRoleLabels,
  severityLabels,
  timeZoneName,
} from '@upstroke/contracts';
import { colors, type Layout } from './layout';
import { measureRows } from './measures';

const yesNo = (v: boolean | null) => (v === null ? 'not recorded' : v ? 'Yes' : 'No');

export function drawHeader(l: Layout, d: Debrief): void {
  const r = d.record;
  const status = r.status === 'signed' ? 'Signed record' : 'Draft — not signed';
  l.text('Resuscitation record', l.left, l.top, { size: 18, weight: 700, color: colors.ink });
  l.text(status, l.right - 180, l.top + 4, {
    size: 10,
    weight: 700,
    width: 180,
    align: 'right',
    color: r.status === 'signed' ? colors.ink : colors.critical,
  });
  l.text(r.siteName, l.left, l.top + 24, { size: 10.5, color: colors.muted });
  l.doc.y = l.top + 44;
  const end = r.arrestAt
    ? new Date(Date.parse(r.arrestAt) + d.measures.durationSec * 1000).toISOString()
    : null;
  l.grid(
    [
      ['Patient reference', r.patientRef ?? 'not recorded'],
      ['Unit', r.unitName ?? 'not recorded'],
      ['Location', r.location ?? 'not recorded'],
      ['Arrest (time zero)', l.clock(r.arrestAt, true)],
      [
        'End of record',
        `${l.clock(end, true)} (${clockFromArrest(d.measures.durationSec)} after arrest)`,
      ],
      [
        'Age group / weight',
        `${r.ageGroup ? ageGroupLabels[r.ageGroup] : 'not recorded'}${r.weightKg ? ` / ${r.weightKg} kg` : ''}`,
      ],
      ['Witnessed', yesNo(r.witnessed)],
      ['Monitored', yesNo(r.monitored)],
      ['First documented rhythm', rhythmName(r.firstRhythm)],
      ['Outcome', r.outcome ? (outcomeLabels[r.outcome] ?? r.outcome) : 'not recorded'],
      ['Recorded by', r.createdByName ?? '—'],
      [
        'Protocol profile',
        d.profile.version ? `${d.profile.name}, version ${d.profile.version}` : d.profile.name,
      ],
    ],
    4,
  );
  const team = (r.roster ?? []).map((m) => `${m.name} (${rosterRoleLabels[m.role]})`).join(', ');
  l.text(`Team: ${team || 'not recorded'}`, l.left, l.doc.y, { size: 9, color: colors.ink });
  const zone = `${l.timeZone} (${timeZoneName(r.arrestAt, l.display)})`;
  l.text(`Times are shown in ${zone}; "+m:ss" is time from the arrest.`, l.left, l.doc.y, {
    size: 7.5,
    color: colors.muted,
  });
}

export function drawMeasures(l: Layout, d: Debrief): void {
  l.heading('Measures');
  l.grid(measureRows(d), 4);
}

export function drawFindings(l: Layout, d: Debrief): void {
  l.heading(`Findings (${d.findings.length})`);
  if (d.findings.length === 0) {
    l.text('No findings for this record with the site’s thresholds.', l.left, l.doc.y, {
      size: 9.5,
    });
    return;
  }
  const textW = l.width - 110;
  for (const f of d.findings) {
    const h = l.height(f.message, textW, 9.5) + l.height(f.caution, textW, 8) + 10;
    l.ensure(h);
    const y = l.doc.y;
    const color = colors[f.severity];
    l.text(severityLabels[f.severity].toUpperCase(), l.left, y, { size: 7.5, weight: 700, color });
    l.text(`+${clockFromArrest(f.startSec)} – +${clockFromArrest(f.endSec)}`, l.left, y + 10, {
      size: 8,
      color: colors.muted,
    });
    const title = findingKindLabels[f.kind] ?? f.kind;
    l.text(
      `${title}${f.confounder ? ` (${confounderLabels[f.confounder]})` : ''}`,
      l.left + 110,
      y,
      { size: 8, weight: 700, color: colors.ink, width: textW },
    );
    l.text(f.message, l.left + 110, l.doc.y + 1, { size: 9.5, color: colors.ink, width: textW });
    l.text(f.caution, l.left + 110, l.doc.y + 1, { size: 8, color: colors.muted, width: textW });
    l.doc.y = Math.max(l.doc.y, y + 22) + 6;
  }
}

export function drawAmendments(l: Layout, d: Debrief): void {
  if (d.amendments.length === 0) return;
  l.heading(`Amendments after signing (${d.amendments.length})`);
  d.amendments.forEach((a, i) => {
    const changes = Object.entries(a.fields).map(
      ([k, v]) => `${k} → ${v === null ? 'cleared' : String(v)}`,
    );
    const what = [...changes, a.eventIds.length ? `${a.eventIds.length} event(s) added` : '']
      .filter(Boolean)
      .join('; ');
    l.ensure(l.height(a.reason, l.width, 9.5) + 36);
    const y = l.doc.y;
    l.text(
      `Amendment ${i + 1} — ${a.createdByName ?? a.createdBy}, ${l.clock(a.createdAt, true)}`,
      l.left,
      y,
      { size: 9, weight: 700 },
    );
    l.text(`Reason: ${a.reason}`, l.left, l.doc.y + 1, { size: 9.5, width: l.width });
    if (what)
      l.text(`Changes: ${what}`, l.left, l.doc.y + 1, {
        size: 8.5,
        color: colors.muted,
        width: l.width,
      });
    l.doc.y += 6;
  });
}

export function drawNotesAndSignature(l: Layout, d: Debrief): void {
  const r = d.record;
  l.heading('Debrief notes');
  for (const [title, body] of [
    ['What went well', r.notesWentWell],
    ['What to change', r.notesToChange],
  ] as const) {
    const text = body?.trim() ? body : 'No notes recorded.';
    l.ensure(l.height(text, l.width, 9.5) + 18);
    l.text(title, l.left, l.doc.y, { size: 8.5, weight: 700, color: colors.muted });
    l.text(text, l.left, l.doc.y + 1, { size: 9.5, width: l.width });
    l.doc.y += 6;
  }
  l.ensure(80);
  l.heading('Signature');
  if (r.status === 'signed') {
    l.text(
      `Signed by ${r.signedByName ?? r.signedBy ?? '—'} on ${l.clock(r.signedAt, true)}.`,
      l.left,
      l.doc.y,
      { size: 10, weight: 700 },
    );
    l.text(
      'The record is locked; later corrections appear above as amendments with their reason.',
      l.left,
      l.doc.y + 2,
      { size: 8.5, color: colors.muted, width: l.width },
    );
  } else {
    l.text('Not signed. This is a draft and may still change.', l.left, l.doc.y, {
      size: 10,
      weight: 700,
      color: colors.critical,
    });
  }
}

import type { DetectedBreath } from '@upstroke/capno';
import type { MonitorImport } from '@upstroke/contracts';
import { randomUUID } from 'node:crypto';
import type { ImportRow } from './imports.repository';
import type { AssembledChunk } from './waveform-assembler';

/** A waveform chunk row on the file's clock (the service shifts it once the offset is known). */
export function toChunkRow(c: AssembledChunk, resuscitationId: string, importId: string) {
  return {
    id: randomUUID(),
    resuscitationId,
    startAt: new Date(c.startMs),
    sampleRateHz: c.sampleRateHz,
    unit: 'mmHg' as const,
    sampleCount: c.values.length,
    samples: Buffer.from(c.values.buffer, c.values.byteOffset, c.values.byteLength),
    source: 'import',
    importId,
  };
}

/** Per-breath EtCO2 values (mmHg) at aligned times: `fileStartMs` + breath time − offset. */
export function toEtco2Rows(
  breaths: readonly DetectedBreath[],
  o: {
    resuscitationId: string;
    importId: string;
    fileStartMs: number;
    offsetSec: number;
    userId: string;
  },
) {
  return breaths.map((b) => ({
    id: randomUUID(),
    resuscitationId: o.resuscitationId,
    at: new Date(o.fileStartMs + (b.tSec - o.offsetSec) * 1000),
    value: Math.round(b.etco2MmHg * 100) / 100,
    unit: 'mmHg',
    valueMmhg: b.etco2MmHg,
    source: 'import',
    importId: o.importId,
    recordedBy: o.userId,
  }));
}

export function toMonitorImport(r: ImportRow): MonitorImport {
  return {
    id: r.id,
    resuscitationId: r.resuscitationId,
    fileName: r.fileName,
    sha256: r.sha256,
    rows: r.rows,
    startedAt: r.startedAt.toISOString(),
    endedAt: r.endedAt.toISOString(),
    unit: r.unit,
    sampleRateHz: r.sampleRateHz,
    offsetSec: r.offsetSec,
    offsetMethod: r.offsetMethod,
    offsetChosenBy: r.offsetChosenBy,
    residualSec: r.residualSec,
    markers: r.markers,
    matchedMarkers: r.matchedMarkers,
    breaths: r.breaths,
    createdAt: r.createdAt.toISOString(),
    createdBy: r.createdBy,
  };
}

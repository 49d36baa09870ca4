import type { DetectedBreath } from '@upstroke/capno';
import type { MonitorImport } from '@upstroke/contracts';
import type { ImportedEtco2, ImportRow } from './imports.repository';

/** Per-breath EtCO2 values (mmHg) at aligned times: `fileStartMs` + breath time − offset. */
export function alignedEtco2(
  breaths: readonly DetectedBreath[],
  o: { fileStartMs: number; offsetSec: number },
): ImportedEtco2[] {
  return breaths.map((b) => ({
    at: new Date(o.fileStartMs + (b.tSec - o.offsetSec) * 1000),
    mmHg: b.etco2MmHg,
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

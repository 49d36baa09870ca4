import { z } from 'zod';

/**
 * The debrief's timeline as one model that every drawing reads (the screen's Chart.js chart
 * and the PDF's vector chart). Times are seconds from the arrest. Built by capno's
 * `composeDebrief`; outputs only scale and colour it.
 *
 * - `span`: the clinical time axis, from 0 to the end of the code (the `end` event, else the
 *   last clinical event or value); amendments never stretch it, and it is bounded so that an
 *   absurd time cannot make the axis (or its ticks) explode;
 * - `ticks`: round minutes across the span, at most about a dozen;
 * - `markers`: one per event in force inside the span, with its short code ('' when the
 *   event has none: the screen may draw its own symbol);
 * - `shaded`: intervals drawn as bands behind the data, by kind (`rosc`: the patient's ROSC
 *   periods, from the engine's patient state);
 * - `gaps`: stretches of the span where a capnogram was being recorded but no signal was
 *   stored (the analysis' `dataGaps`: a data gap, never a clinical finding);
 * - `rises`: EtCO2 rises, with the confounder that came just before when there was one.
 */
export const timelineShadeKindSchema = z.enum(['compressions', 'etco2-low', 'rosc']);
export type TimelineShadeKind = z.infer<typeof timelineShadeKindSchema>;

export const timelineMarkerSchema = z.object({
  id: z.string(),
  tSec: z.number(),
  kind: z.string(),
  code: z.string(),
  label: z.string(),
  amendment: z.boolean(),
});
export type TimelineMarker = z.infer<typeof timelineMarkerSchema>;

export const timelineModelSchema = z.object({
  span: z.object({ startSec: z.number(), endSec: z.number() }),
  ticks: z.array(z.object({ tSec: z.number(), label: z.string() })),
  markers: z.array(timelineMarkerSchema),
  shaded: z.array(
    z.object({ kind: timelineShadeKindSchema, startSec: z.number(), endSec: z.number() }),
  ),
  gaps: z.array(z.object({ startSec: z.number(), endSec: z.number() })),
  rises: z.array(z.object({ tSec: z.number(), confounder: z.string().nullable() })),
});
export type TimelineModel = z.infer<typeof timelineModelSchema>;

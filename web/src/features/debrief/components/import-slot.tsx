/**
 * SLOT for the monitor-file import (issue 5): their `ImportPanel`
 * (`features/imports/components/import-panel.tsx`, props `{ resuscitationId,
 * onOffsetPreview? }`) renders here once it lands. Until then nothing is shown.
 */
export function ImportSlot(_props: { resuscitationId: string }) {
  return null;
}

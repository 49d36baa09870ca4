import type { RecordingContext } from '@upstroke/contracts';

/**
 * Tablet clock minus server clock, from one request: the server read its clock somewhere
 * between our send and our receipt, so the midpoint is the best single estimate and half
 * the round trip bounds the error.
 */
export function estimateClockOffset(
  sentAt: number,
  receivedAt: number,
  serverTime: string,
): number {
  return Math.round((sentAt + receivedAt) / 2 - Date.parse(serverTime));
}

export async function measureClock(
  fetchContext: () => Promise<RecordingContext>,
  now: () => number = Date.now,
): Promise<{ context: RecordingContext; offsetMs: number; roundTripMs: number }> {
  const sentAt = now();
  const context = await fetchContext();
  const receivedAt = now();
  return {
    context,
    offsetMs: estimateClockOffset(sentAt, receivedAt, context.serverTime),
    roundTripMs: receivedAt - sentAt,
  };
}

// Apart from the discard schemas, so the tablet's store (loaded before Live's first draw) needs
// no zod for it.

/** Most characters of one discarded entry's content kept in the audit log. */
export const DISCARD_CONTENT_MAX = 20_000;

/** The JSON text of an entry for a discard, cut to the stored length with a note. */
export function discardContent(entry: unknown): string {
  const text = JSON.stringify(entry) ?? 'null';
  if (text.length <= DISCARD_CONTENT_MAX) return text;
  // Never cut between the two halves of a surrogate pair (that would leave a lone one).
  const high = /[\uD800-\uDBFF]/.test(text.charAt(DISCARD_CONTENT_MAX - 1));
  const end = high ? DISCARD_CONTENT_MAX - 1 : DISCARD_CONTENT_MAX;
  return `${text.slice(0, end)}… (cut: ${text.length} characters in all)`;
}

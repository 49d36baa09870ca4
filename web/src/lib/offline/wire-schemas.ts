/**
 * The schemas the tablet checks the server's answers against while recording. They sit in a
 * chunk of their own with zod, loaded by `wireSchemas()` when the first answer arrives, so
 * Live draws (and takes taps, which go to IndexedDB) before zod is fetched and parsed.
 */
export {
  batchResultSchema,
  discardResultSchema,
  liveFeedMessageSchema,
  recordEntriesSchema,
  recordingContextSchema,
  resuscitationSchema,
} from '@upstroke/contracts';

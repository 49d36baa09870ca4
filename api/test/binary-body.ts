/** supertest parser that keeps a response body (a PDF) as bytes. */
export function binaryBody(
  res: { on: (e: string, cb: (c?: Buffer) => void) => void },
  cb: (e: Error | null, b: Buffer) => void,
): void {
  const parts: Buffer[] = [];
  res.on('data', (c) => parts.push(c as Buffer));
  res.on('end', () => cb(null, Buffer.concat(parts)));
}

import { createServer } from 'node:net';

/**
 * A loopback port nothing listens on, chosen by the system: tests never take a fixed port
 * that another test run on the same machine may hold.
 */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = createServer();
    s.once('error', reject);
    s.listen(0, '127.0.0.1', () => {
      const address = s.address();
      s.close(() => resolve(typeof address === 'object' && address ? address.port : 0));
    });
  });
}

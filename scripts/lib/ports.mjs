// Loopback ports for the test run: the preferred one when it is free, else one the system picks,
// so two `npm test` runs (or `npm start` beside one) never meet on a port.
import net from 'node:net';

function listenOnce(port, host) {
  return new Promise((resolve) => {
    const server = net.createServer();
    server.once('error', () => resolve(null));
    server.listen(port, host, () => {
      const address = server.address();
      server.close(() => resolve(typeof address === 'object' && address ? address.port : null));
    });
  });
}

/** `preferred` when nothing listens there, otherwise a free port the system chooses. */
export async function freePort(preferred, taken = new Set()) {
  if (preferred && !taken.has(preferred) && (await listenOnce(preferred, '127.0.0.1')))
    return preferred;
  for (;;) {
    const port = await listenOnce(0, '127.0.0.1');
    if (port && !taken.has(port)) return port;
  }
}

/** One free port per name, all different from each other. */
export async function freePorts(preferred) {
  const taken = new Set();
  const chosen = {};
  for (const [name, port] of Object.entries(preferred)) {
    chosen[name] = await freePort(port, taken);
    taken.add(chosen[name]);
  }
  return chosen;
}

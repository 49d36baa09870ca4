// Waits until a URL answers 200 (or the process that should serve it exits).
export async function waitForHttp(url, timeoutMs, child) {
  const deadline = Date.now() + timeoutMs;
  let exited = false;
  child?.once('exit', () => {
    exited = true;
  });
  while (Date.now() < deadline && !exited) {
    try {
      const res = await fetch(url);
      if (res.ok) return true;
    } catch {
      // Not listening yet.
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  return false;
}

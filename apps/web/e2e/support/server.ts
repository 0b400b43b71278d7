import { createServer } from 'node:net';

/** A port nothing listens on right now (the OS picks it). */
export const freePort = () =>
  new Promise<number>((ok) => {
    const srv = createServer();
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address() as { port: number };
      srv.close(() => ok(port));
    });
  });

/** Waits up to a minute for a built server started by a spec to answer its liveness check. */
export async function waitForHealth(base: string): Promise<void> {
  for (let i = 0; i < 240; i++) {
    const ok = await fetch(`${base}/api/health`).then(
      (r) => r.ok,
      () => false,
    );
    if (ok) return;
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error('the API did not start');
}

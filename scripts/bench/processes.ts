/** What both benchmarks need to run servers of their own: a free loopback port, and waiting for one to answer. */
import type { ChildProcess } from 'node:child_process';
import net from 'node:net';

export async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = net.createServer();
    s.once('error', reject);
    s.listen(0, '127.0.0.1', () => {
      const { port } = s.address() as net.AddressInfo;
      s.close(() => resolve(port));
    });
  });
}

/** Polls `url` until it answers (any status), for at most 60 s or until `child` exits. */
export async function waitFor(url: string, child: ChildProcess) {
  for (let i = 0; i < 300; i++) {
    if (child.exitCode !== null) throw new Error(`${url}: the process exited (${child.exitCode})`);
    try {
      await fetch(url);
      return;
    } catch {
      await new Promise((r) => setTimeout(r, 200));
    }
  }
  throw new Error(`${url} did not answer within 60 s`);
}

/**
 * A private Redis for the shared rate-limit counts: Debian's `redis-server`, installed when
 * missing, started on 127.0.0.1 on a port of our choosing with nothing written to disk. Only the
 * tests and `npm run cluster` use it; `npm start` counts in memory and needs no Redis.
 */
import { spawn } from 'node:child_process';
import net from 'node:net';
import { ensureDebianPackage } from './mariadb';

export interface RunningRedis {
  port: number;
  url: string;
  pid: number;
  stop(): Promise<void>;
}

/** A port nobody listens on right now (the kernel picks it). */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as net.AddressInfo;
      server.close(() => resolve(port));
    });
  });
}

function answers(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = net.connect({ host: '127.0.0.1', port });
    socket.once('connect', () => {
      socket.write('PING\r\n');
    });
    socket.once('data', (data) => {
      socket.destroy();
      resolve(data.toString().startsWith('+PONG'));
    });
    socket.once('error', () => resolve(false));
  });
}

/** Starts redis-server on the port (a free one when not given) and waits until it answers PING. */
export async function startRedis(port?: number): Promise<RunningRedis> {
  const command = ensureDebianPackage('redis-server', 'redis-server');
  const chosen = port ?? (await freePort());
  const child = spawn(command, ['--port', String(chosen), '--bind', '127.0.0.1', '--save', '', '--appendonly', 'no', '--daemonize', 'no', '--loglevel', 'warning'], {
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  let exited = false;
  child.once('exit', () => (exited = true));
  const deadline = Date.now() + 10_000;
  while (!(await answers(chosen))) {
    if (exited) throw new Error(`redis-server exited early on port ${chosen}`);
    if (Date.now() > deadline) throw new Error(`redis-server did not answer on port ${chosen} within 10 s`);
    await new Promise((r) => setTimeout(r, 100));
  }
  return {
    port: chosen,
    url: `redis://127.0.0.1:${chosen}`,
    pid: child.pid!,
    stop: () =>
      new Promise<void>((resolve) => {
        if (exited) return resolve();
        child.once('exit', () => resolve());
        child.kill('SIGTERM');
      }),
  };
}

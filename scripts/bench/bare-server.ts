/**
 * The bare baseline of `npm run bench:api`: node:http and mysql2, no framework. `/replay/<name>`
 * runs, in order, the exact statements Wortwise ran for that request (recorded by
 * scripts/bench/api.ts from the same database) and answers their rows as JSON; `/calc` answers
 * the same shared function the public late-boil check calls. Started as a
 * child process by the bench, on loopback only.
 */
import { readFileSync } from 'node:fs';
import http from 'node:http';
import mysql from 'mysql2/promise';

import { boilCorrection, type BoilCorrectionInput } from '@shared/brewmath';

interface Statement {
  sql: string;
  params: unknown[];
}

const recorded = JSON.parse(readFileSync(process.env.BENCH_STATEMENTS!, 'utf8')) as Record<string, Statement[]>;
const pool = mysql.createPool({ uri: process.env.DATABASE_URL!, connectionLimit: 10, timezone: 'Z' });

function send(res: http.ServerResponse, status: number, body: unknown) {
  const text = JSON.stringify(body);
  res.writeHead(status, { 'Content-Type': 'application/json; charset=utf-8', 'Content-Length': Buffer.byteLength(text) });
  res.end(text);
}

async function readBody(req: http.IncomingMessage): Promise<string> {
  const chunks: Buffer[] = [];
  for await (const c of req) chunks.push(c as Buffer);
  return Buffer.concat(chunks).toString('utf8');
}

const server = http.createServer((req, res) => {
  void (async () => {
    try {
      const url = req.url ?? '/';
      if (url === '/calc' && req.method === 'POST') {
        send(res, 200, boilCorrection(JSON.parse(await readBody(req)) as BoilCorrectionInput));
        return;
      }
      const name = url.startsWith('/replay/') ? url.slice('/replay/'.length) : null;
      const statements = name ? recorded[name] : undefined;
      if (!statements) {
        send(res, 404, { error: 'not_found' });
        return;
      }
      if (req.method === 'POST') await readBody(req);
      let last: unknown = null;
      for (const s of statements) [last] = await pool.query(s.sql, s.params);
      send(res, req.method === 'POST' ? 201 : 200, last);
    } catch (error) {
      send(res, 500, { error: String(error) });
    }
  })();
});

server.listen(Number(process.env.PORT), '127.0.0.1', () => console.log('bare baseline listening'));
process.once('SIGTERM', () => {
  server.close();
  server.closeAllConnections();
  void pool.end().then(() => process.exit(0));
});

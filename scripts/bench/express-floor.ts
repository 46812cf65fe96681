/**
 * A reference for `npm run bench:api`, not a baseline: the smallest Express app that serves the
 * public calculation (Express 5, `express.json()`, the same shared function, `res.json`), with
 * none of Wortwise's security headers, cross-site guard, rate limit or validation. Its ratio to the
 * bare node:http baseline shows what the framework alone costs on this machine, so a reader can
 * tell how much of the gap is Wortwise's own. Started as a child process by the bench, on loopback only.
 */
import express from 'express';
import { boilCorrection, type BoilCorrectionInput } from '@shared/brewmath';

const app = express();
app.disable('x-powered-by');
app.set('etag', false);
app.get('/ready', (_req, res) => {
  res.json({ ok: true });
});
app.post('/calc', express.json(), (req, res) => {
  res.json(boilCorrection(req.body as BoilCorrectionInput));
});

const server = app.listen(Number(process.env.PORT), '127.0.0.1', () => console.log('Express floor listening'));
process.once('SIGTERM', () => {
  server.close();
  server.closeAllConnections();
  process.exit(0);
});

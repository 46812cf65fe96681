/** Instruments: the request shapes and vocabulary (inputs.ts), the answers and snapshots (responses.ts). */
export * from './inputs';
export * from './responses';

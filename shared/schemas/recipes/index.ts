/** Recipes: the request shapes and vocabulary (inputs.ts) and the answers (responses.ts). */
export * from './inputs';
export * from './responses';

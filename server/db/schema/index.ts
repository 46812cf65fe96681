// Every table of the product; drizzle-kit reads this file to generate migrations.
export * from './users';
export * from './clubs';
export * from './password-reset';
export * from './recipes';
export * from './brews';
export * from './instruments';
export * from './fermentation';
export * from './comments';
export * from './idempotency';
export * from './sessions';

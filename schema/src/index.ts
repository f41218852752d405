// Every table of Couplet, for Drizzle's client and drizzle-kit.
export * from './users';
export * from './workspaces';
export * from './invitations';
export * from './sessions';
export * from './password-resets';
export * from './outbox';
export * from './audit';
export * from './coils';
export * from './studies';
export * from './revisions';
export * from './sweep-runs';
export * from './comments';
export * from './bench-data';

export * from './client.js';
export * from './schema/index.js';
export * from './seed.js';

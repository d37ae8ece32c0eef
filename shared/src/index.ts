export * from './auth.js';
export * from './errors.js';

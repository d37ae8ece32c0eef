export * from './auth.js';
export * from './errors.js';
export * from './karts.js';

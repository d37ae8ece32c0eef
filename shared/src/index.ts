export * from './auth.js';
export * from './errors.js';
export * from './karts.js';
export * from './setup.js';
export * from './diagnosis.js';

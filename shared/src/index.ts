export * from './auth.js';
export * from './errors.js';
export * from './karts.js';
export * from './setup.js';
export * from './diagnosis.js';
export * from './air/index.js';
export * from './units/index.js';
export * from './jetting/index.js';

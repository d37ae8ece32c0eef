export * from './users.js';
export * from './sessions.js';
export * from './karts.js';
export * from './setups.js';
export * from './cases.js';
export * from './jetting.js';
export * from './sharing.js';
export * from './learning.js';

export * from './vapour.js';
export * from './cipm2007.js';
export * from './isa.js';
export * from './j1349.js';
export * from './compute-air.js';

export * from './jet-suggestion.js';

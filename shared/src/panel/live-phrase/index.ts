export * from './live-phrase.js';
export * from './live-phrase-reading.js';
export * from './live-phrase-wordings.js';
export * from './state-words.js';

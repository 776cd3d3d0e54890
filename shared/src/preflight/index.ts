export * from './types.js';
export { measuresReadingLevel, READING_TARGETS, type ReadingTarget } from './reading-level.js';
export { textContrastRule, type PanelColourScheme } from './text-contrast.js';
export { PREFLIGHT_RULES, runPreflight, preflightBlockers } from './run-preflight.js';

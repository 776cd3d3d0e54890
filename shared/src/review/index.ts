export * from './story-workflow.js';
export * from './revision-snapshot.js';
export * from './panel-diff.js';
export * from './views.js';
export * from './comment-anchor.js';
export * from './draft-comments.js';

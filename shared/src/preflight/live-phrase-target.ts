import { danglingLivePhrases } from '../panel/live-phrase/index.js';
import { livePhrasesIn } from '../panel/panel-queries.js';
import { inlineTargetFindings } from './inline-targets.js';
import type { PreflightRule } from './types.js';

/** A live phrase that cannot follow its widget would show a dash in the middle of a sentence. */
export const livePhraseTarget: PreflightRule = {
  id: 'live-phrase-target',
  severity: 'blocker',
  run: (context) =>
    inlineTargetFindings(context, {
      nodesIn: livePhrasesIn,
      dangling: danglingLivePhrases,
      fix: 'Word it for each state of a widget on this panel, or remove it.',
      passed: (name) => `${name}: every live phrase follows a widget on this panel and is worded for each of its states.`,
      noneApply: 'No panel has a live phrase.',
    }),
};

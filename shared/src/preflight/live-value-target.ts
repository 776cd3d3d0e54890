import { danglingLiveValues } from '../panel/live-value/index.js';
import { liveValuesIn } from '../panel/panel-queries.js';
import { inlineTargetFindings } from './inline-targets.js';
import type { PreflightRule } from './types.js';

/** A live value with no widget to read would show a dash where the caption's number should be, in any language. */
export const liveValueTarget: PreflightRule = {
  id: 'live-value-target',
  severity: 'blocker',
  run: (context) =>
    inlineTargetFindings(context, {
      nodesIn: liveValuesIn,
      dangling: danglingLiveValues,
      fix: 'Point it at a widget on this panel, or remove it.',
      passed: (name) => `${name}: every live value reads a widget on this panel.`,
      noneApply: 'No panel has a live value.',
    }),
};

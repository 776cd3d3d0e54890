import { panelFindings } from './panel-findings.js';
import type { PreflightRule } from './types.js';
import { checkedWidgets } from './widget-findings.js';

/** A widget the shared validation refuses cannot be drawn or computed on the kiosk. */
export const widgetParams: PreflightRule = {
  id: 'widget-params',
  severity: 'blocker',
  run: (context) =>
    panelFindings(
      context,
      (panel, name) => {
        if (panel.widgets.length === 0) return null;
        const problems = checkedWidgets(panel.widgets).flatMap(({ name: widget, check }) =>
          check.ok ? [] : [`${name}: ${widget} has settings to fix. ${check.errors.map((error) => error.message).join(' ')} Open the widget's settings and correct them.`],
        );
        return { problems, passed: `${name}: every widget's settings pass the science checks.` };
      },
      'No panel has a widget.',
    ),
};

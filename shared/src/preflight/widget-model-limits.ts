import { panelFindings } from './panel-findings.js';
import type { PreflightRule } from './types.js';
import { checkedWidgets } from './widget-findings.js';

/**
 * The widgets are simplified teaching models; each widget module says where its model stops
 * holding (for example a Rayleigh number below the onset of convection: Ra_c = 27π⁴/4 ≈ 657.5 in
 * a wide layer between free-slip walls, higher in a narrow box; Rayleigh 1916, Chandrasekhar 1961).
 * Widgets that fail validation are the params check's to report.
 */
export const widgetModelLimits: PreflightRule = {
  id: 'widget-model-limits',
  severity: 'warning',
  run: (context) =>
    panelFindings(
      context,
      (panel, name) => {
        const valid = checkedWidgets(panel.widgets).filter(({ check }) => check.ok);
        if (valid.length === 0) return null;
        const problems = valid.flatMap(({ name: widget, check }) =>
          check.ok ? check.warnings.map((warning) => `${name}: ${widget} is set outside the range where its simplified model holds. ${warning.message}`) : [],
        );
        return { problems, passed: `${name}: every widget is set within the range where its model holds.` };
      },
      'No panel has a widget with valid settings.',
    ),
};

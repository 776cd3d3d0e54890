import type { SnapshotWidget } from '../review/revision-snapshot.js';
import { checkWidget, isWidgetType, widgetJsonSchema, type WidgetCheck } from '../widgets/registry.js';

/** "the slope force box “ridge-slope”": the widget's kind as the studio's menu names it, and its id. */
export function widgetName(widget: SnapshotWidget): string {
  const title = isWidgetType(widget.widgetType) ? widgetJsonSchema(widget.widgetType).title : undefined;
  const kind = typeof title === 'string' ? title.toLowerCase() : 'widget';
  return `the ${kind} “${widget.widgetId}”`;
}

export interface CheckedWidget {
  widget: SnapshotWidget;
  name: string;
  check: WidgetCheck;
}

/** Each widget with the shared validation's verdict, the same check the studio form and the server's save run. */
export const checkedWidgets = (widgets: readonly SnapshotWidget[]): CheckedWidget[] =>
  widgets.map((widget) => ({ widget, name: widgetName(widget), check: checkWidget(widget.widgetType, widget.params) }));

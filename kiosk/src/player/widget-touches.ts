import { widgetsIn, type PanelDocJSON } from '@mantlepiece/shared/kiosk';
import type { VisitorEvent } from '../outbox/event-outbox';

const sameValue = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

/**
 * Turns touches on a panel's widgets into "widget touched" events: one per param a visitor moves
 * in one gesture (a drag sends many changes), or one without a param for a widget that has none
 * to move (the convection cell is watched, not set).
 */
export class WidgetTouches {
  private gesture: { widgetType: string; reported: Set<string> } | null = null;
  private readonly lastParams = new Map<string, Record<string, unknown>>();

  constructor(private readonly doc: PanelDocJSON, private readonly where: { storyId: number; panelId: number }, private readonly record: (event: VisitorEvent) => void) {}

  pointerDown(target: EventTarget | null): void {
    const widget = target instanceof Element ? target.closest<HTMLElement>('.mp-widget[data-widget-type]') : null;
    this.gesture = widget ? { widgetType: widget.dataset.widgetType!, reported: new Set() } : null;
  }

  paramsChanged(widgetId: string, params: Record<string, unknown>): void {
    const widget = widgetsIn(this.doc).find((candidate) => candidate.widgetId === widgetId);
    if (!widget) return;
    const before = this.lastParams.get(widgetId) ?? (widget.params as Record<string, unknown>);
    this.lastParams.set(widgetId, params);
    const gesture = this.gesture ?? { widgetType: widget.widgetType, reported: new Set<string>() };
    this.gesture = gesture;
    for (const param of Object.keys(params)) {
      if (sameValue(before[param], params[param]) || gesture.reported.has(param)) continue;
      gesture.reported.add(param);
      this.record({ type: 'widget_touched', ...this.where, widgetType: widget.widgetType, param });
    }
  }

  gestureEnded(): void {
    if (this.gesture && this.gesture.reported.size === 0) this.record({ type: 'widget_touched', ...this.where, widgetType: this.gesture.widgetType });
    this.gesture = null;
  }
}

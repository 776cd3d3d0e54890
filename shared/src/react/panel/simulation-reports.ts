import type { SimulationReport } from '../../widgets/index.js';

/**
 * What each widget's running simulation last reported, within one editor. The widget's node view
 * writes it and the live values' node views read it, so a live value of Nu follows the drawing
 * beside it as it does on a kiosk.
 */
export class SimulationReports {
  private readonly byWidget = new Map<string, SimulationReport>();
  private readonly listeners = new Set<() => void>();

  get = (widgetId: string): SimulationReport | undefined => this.byWidget.get(widgetId);

  set(widgetId: string, report: SimulationReport): void {
    this.byWidget.set(widgetId, report);
    for (const listener of this.listeners) listener();
  }

  subscribe = (listener: () => void): (() => void) => {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  };
}

/**
 * The setting each widget is being tried at in one editor, while the curator tries it (dragging the
 * slope): the widget's node view writes it and the live values' and phrases' node views read it, so
 * the text says what the drawing shows, marked as a trial, and goes back to the saved setting after.
 */
export class WidgetTrials {
  private readonly byWidget = new Map<string, Record<string, unknown>>();
  private readonly listeners = new Set<() => void>();

  get = (widgetId: string): Record<string, unknown> | undefined => this.byWidget.get(widgetId);

  set(widgetId: string, params: Record<string, unknown> | null): void {
    if (params === null ? !this.byWidget.delete(widgetId) : this.byWidget.get(widgetId) === params) return;
    if (params !== null) this.byWidget.set(widgetId, params);
    for (const listener of this.listeners) listener();
  }

  subscribe = (listener: () => void): (() => void) => {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  };
}

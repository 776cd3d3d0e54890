import { NodeViewWrapper, type ReactNodeViewProps } from '@tiptap/react';
import { useEffect, useState, type CSSProperties } from 'react';
import { isPlainObject } from '../../panel/panel-json.js';
import { widgetTitle } from '../../widgets/widget-title.js';
import { PanelWidget } from './PanelWidget.js';
import type { PanelEditorOptions } from './panel-editor-options.js';

const OWN_EVENTS_CLASS = 'mp-widget-drawing';
const handleStyle: CSSProperties = { cursor: 'grab', userSelect: 'none', fontSize: '0.8em', padding: '0.2em 0.4em' };
const trialStyle: CSSProperties = { display: 'flex', flexWrap: 'wrap', alignItems: 'center', gap: '0.5em', fontSize: '0.85em', padding: '0.3em 0.4em' };

/**
 * The editor leaves every event inside the drawing (and the trial bar under it) to the widget, a
 * drag's start included, so dragging the slope or a slider can neither select nor move the block;
 * only the grip above moves it. Drags passing over the drawing and drops on it stay the editor's,
 * so a block moved by its grip can still land there.
 */
export function isWidgetDrawingEvent({ event }: { event: Event }): boolean {
  if (event.type !== 'dragstart' && (event.type.startsWith('drag') || event.type === 'drop')) return false;
  const target = event.target;
  return target instanceof Element && target.closest(`.${OWN_EVENTS_CLASS}`) !== null;
}

const sameParams = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

/**
 * The widget block in the studio editor, drawn live by the same component the kiosk uses. Trying
 * it here (dragging the slope) changes only what the editor shows; the saved setting changes when
 * the curator says so, or in the side form.
 */
export function WidgetNodeView({ node, extension, selected, updateAttributes }: ReactNodeViewProps) {
  const { locale, simulationReports, widgetTrials, widgetTrialLabels } = extension.options as PanelEditorOptions;
  const widgetType = String(node.attrs.widgetType);
  const widgetId = String(node.attrs.widgetId);
  const saved = isPlainObject(node.attrs.params) ? node.attrs.params : {};
  // A trial belongs to the setting it started from: a change in the side form ends it.
  const [trial, setTrial] = useState<{ from: Record<string, unknown>; params: Record<string, unknown> } | null>(null);
  const tried = trial && trial.from === saved && !sameParams(trial.params, saved) ? trial.params : null;
  // The panel's live values and phrases follow the trial while it lasts.
  useEffect(() => {
    widgetTrials?.set(widgetId, tried);
  }, [widgetTrials, widgetId, tried]);
  useEffect(() => () => widgetTrials?.set(widgetId, null), [widgetTrials, widgetId]);
  return (
    <NodeViewWrapper className="mp-widget-node" data-selected={selected || undefined} data-trying={tried ? '' : undefined}>
      <div className="mp-widget-node-handle" data-drag-handle="" style={handleStyle}>
        {`⠿ ${widgetTitle(widgetType, locale)}`}
      </div>
      {/* With the block selected, a press inside it would start the browser's own drag of the selection, which takes the pointer from the widget. */}
      <div className={OWN_EVENTS_CLASS} onMouseDown={(event) => event.preventDefault()} onDragStart={(event) => event.preventDefault()}>
        <PanelWidget
          widgetType={widgetType}
          params={tried ?? saved}
          locale={locale}
          reducedMotion
          highContrast={false}
          editing
          onParamsChange={(params) => setTrial({ from: saved, params })}
          onReport={(report) => simulationReports?.set(widgetId, report)}
        />
        {tried && widgetTrialLabels ? (
          <div className="mp-widget-trial" role="group" aria-label={widgetTrialLabels.trying} style={trialStyle}>
            <span>{widgetTrialLabels.trying}</span>
            <button
              type="button"
              onClick={() => {
                updateAttributes({ params: tried });
                setTrial(null);
              }}
            >
              {widgetTrialLabels.keep}
            </button>
            <button type="button" onClick={() => setTrial(null)}>
              {widgetTrialLabels.reset}
            </button>
          </div>
        ) : null}
      </div>
    </NodeViewWrapper>
  );
}

import { NodeViewWrapper, type ReactNodeViewProps } from '@tiptap/react';
import type { CSSProperties } from 'react';
import { isPlainObject } from '../../panel/panel-json.js';
import { widgetTitle } from '../../widgets/widget-title.js';
import { PanelWidget } from './PanelWidget.js';
import type { PanelEditorOptions } from './panel-editor-options.js';

const DRAWING_CLASS = 'mp-widget-drawing';
const handleStyle: CSSProperties = { cursor: 'grab', userSelect: 'none', fontSize: '0.8em', padding: '0.2em 0.4em' };

/**
 * The editor leaves pointer and key events inside the drawing to the widget, so a curator can
 * drag the slope or a slider without the editor selecting or dragging the block; the grip above
 * selects and moves it.
 */
export function isWidgetDrawingEvent({ event }: { event: Event }): boolean {
  if (event.type.startsWith('drag') || event.type === 'drop') return false;
  const target = event.target;
  return target instanceof Element && target.closest(`.${DRAWING_CLASS}`) !== null;
}

/** The widget block in the studio editor, drawn live by the same component the kiosk uses. */
export function WidgetNodeView({ node, extension, selected, updateAttributes }: ReactNodeViewProps) {
  const { locale, simulationReports } = extension.options as PanelEditorOptions;
  const widgetType = String(node.attrs.widgetType);
  const widgetId = String(node.attrs.widgetId);
  return (
    <NodeViewWrapper className="mp-widget-node" data-selected={selected || undefined}>
      <div className="mp-widget-node-handle" data-drag-handle="" style={handleStyle}>
        {`⠿ ${widgetTitle(widgetType, locale)}`}
      </div>
      <div className={DRAWING_CLASS} onDragStart={(event) => event.preventDefault()}>
        <PanelWidget
          widgetType={widgetType}
          params={isPlainObject(node.attrs.params) ? node.attrs.params : {}}
          locale={locale}
          reducedMotion
          highContrast={false}
          editing
          onParamsChange={(params) => updateAttributes({ params })}
          onReport={(report) => simulationReports?.set(widgetId, report)}
        />
      </div>
    </NodeViewWrapper>
  );
}

import { describe, expect, it } from 'vitest';
import type { PanelDocJSON } from '@mantlepiece/shared/kiosk';
import type { VisitorEvent } from '../outbox/event-outbox';
import { WidgetTouches } from './widget-touches';

const doc: PanelDocJSON = {
  type: 'doc',
  content: [{ type: 'widget', attrs: { widgetId: 'ridge-slope', widgetType: 'slope-force', params: { angleDeg: 20, mu: 0.6 } } }],
};

function widgetElement(widgetType: string) {
  const block = document.createElement('div');
  block.className = 'mp-widget';
  block.dataset.widgetType = widgetType;
  const handle = document.createElement('span');
  block.append(handle);
  return handle;
}

describe('widget touches', () => {
  it('records one event per param moved in a drag, and a fresh one for the next drag', () => {
    const events: VisitorEvent[] = [];
    const touches = new WidgetTouches(doc, { storyId: 7, panelId: 701 }, (event) => events.push(event));
    touches.pointerDown(widgetElement('slope-force'));
    for (const angleDeg of [21, 22, 23]) touches.paramsChanged('ridge-slope', { angleDeg, mu: 0.6 });
    touches.gestureEnded();
    touches.pointerDown(widgetElement('slope-force'));
    touches.paramsChanged('ridge-slope', { angleDeg: 23, mu: 0.7 });
    touches.gestureEnded();
    expect(events).toEqual([
      { type: 'widget_touched', storyId: 7, panelId: 701, widgetType: 'slope-force', param: 'angleDeg' },
      { type: 'widget_touched', storyId: 7, panelId: 701, widgetType: 'slope-force', param: 'mu' },
    ]);
  });

  it('records a touch on a widget with no param to move', () => {
    const events: VisitorEvent[] = [];
    const touches = new WidgetTouches(doc, { storyId: 7, panelId: 702 }, (event) => events.push(event));
    touches.pointerDown(widgetElement('convection-cell'));
    touches.gestureEnded();
    touches.pointerDown(document.body);
    touches.gestureEnded();
    expect(events).toEqual([{ type: 'widget_touched', storyId: 7, panelId: 702, widgetType: 'convection-cell' }]);
  });
});

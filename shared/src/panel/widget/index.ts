export * from './widget.js';
export * from './widget-id.js';
export { uniqueWidgetIds, uniqueWidgetIdsKey } from './unique-widget-ids.js';

export * from './widget.js';
export * from './widget-id.js';
export { uniqueWidgetIds } from './unique-widget-ids.js';

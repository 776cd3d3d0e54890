import { mergeAttributes, Node, type CommandProps } from '@tiptap/core';
import { jsonFromHTML, panelIdAttribute } from '../node-attributes.js';
import { isPlainObject, WIDGET_NODE } from '../panel-json.js';
import { uniqueWidgetIds } from './unique-widget-ids.js';
import { newWidgetId } from './widget-id.js';

export interface InsertWidgetOptions {
  widgetType: string;
  params: Record<string, unknown>;
  /** Given only when the caller must know the id up front (to insert a live value next to it). */
  widgetId?: string;
}

export interface WidgetOptions {
  HTMLAttributes: Record<string, unknown>;
}

declare module '@tiptap/core' {
  interface Commands<ReturnType> {
    widget: {
      /** Inserts a widget block at the selection. */
      insertWidget: (options: InsertWidgetOptions) => ReturnType;
      /** Replaces the params of the widget with this id (the side form's save). */
      setWidgetParams: (widgetId: string, params: Record<string, unknown>) => ReturnType;
      /** Whether visitors may open the widget's model card ("How do we know?") on the kiosk. */
      setWidgetModelCard: (widgetId: string, shown: boolean) => ReturnType;
    };
  }
}

const TYPE_PATTERN = /^[a-z][a-z0-9-]{0,63}$/;

function assertWidgetType(value: unknown): void {
  if (typeof value !== 'string' || !TYPE_PATTERN.test(value)) throw new RangeError('A widget type is a lower-case name such as "slope-force".');
}

function assertParams(value: unknown): void {
  if (!isPlainObject(value)) throw new RangeError("A widget's params must be an object of named settings.");
}

const paramsFromHTML = (element: HTMLElement) => jsonFromHTML(element, 'data-params', isPlainObject);

/** A command setting one attribute of the widget with this id; false when there is none. */
const setWidgetAttribute =
  (nodeName: string, widgetId: string, attribute: string, value: unknown) =>
    ({ tr, state, dispatch }: CommandProps) => {
      let found: number | null = null;
      state.doc.descendants((node, pos) => {
        if (found !== null) return false;
        if (node.type.name === nodeName && node.attrs.widgetId === widgetId) found = pos;
        return node.type.name !== nodeName;
      });
      if (found === null) return false;
      if (dispatch) tr.setNodeAttribute(found, attribute, value);
      return true;
    };

/**
 * An interactive simulation as one block. Its params are checked against the widget registry by
 * `checkPanelDocument`, not here, so the schema stays the same whichever widgets exist.
 */
export const Widget = Node.create<WidgetOptions>({
  name: WIDGET_NODE,
  group: 'block',
  atom: true,
  selectable: true,
  draggable: true,
  isolating: true,

  addOptions() {
    return { HTMLAttributes: {} };
  },

  addAttributes() {
    return {
      widgetType: {
        default: null,
        validate: assertWidgetType,
        parseHTML: (element: HTMLElement) => element.getAttribute('data-widget-type'),
        renderHTML: (attributes: Record<string, unknown>) => ({ 'data-widget-type': attributes.widgetType }),
      },
      widgetId: panelIdAttribute('widgetId', 'data-widget-id'),
      params: {
        default: {},
        validate: assertParams,
        parseHTML: paramsFromHTML,
        renderHTML: (attributes: Record<string, unknown>) => ({ 'data-params': JSON.stringify(attributes.params) }),
      },
      visitorModelCard: {
        default: false,
        validate: 'boolean',
        parseHTML: (element: HTMLElement) => element.hasAttribute('data-visitor-model-card'),
        renderHTML: (attributes: Record<string, unknown>) => (attributes.visitorModelCard ? { 'data-visitor-model-card': '' } : {}),
      },
    };
  },

  parseHTML() {
    return [
      {
        tag: 'div[data-widget-type]',
        getAttrs: (element: HTMLElement) => (TYPE_PATTERN.test(element.getAttribute('data-widget-type') ?? '') && paramsFromHTML(element) ? null : false),
      },
    ];
  },

  renderHTML({ HTMLAttributes }) {
    return ['div', mergeAttributes(this.options.HTMLAttributes, HTMLAttributes)];
  },

  addCommands() {
    return {
      insertWidget:
        ({ widgetType, params, widgetId }) =>
          ({ commands }) =>
            commands.insertContent({ type: this.name, attrs: { widgetType, params, widgetId: widgetId ?? newWidgetId() } }),
      setWidgetParams: (widgetId, params) => setWidgetAttribute(this.name, widgetId, 'params', params),
      setWidgetModelCard: (widgetId, shown) => setWidgetAttribute(this.name, widgetId, 'visitorModelCard', shown),
    };
  },

  addProseMirrorPlugins() {
    return [uniqueWidgetIds(this.name)];
  },
});

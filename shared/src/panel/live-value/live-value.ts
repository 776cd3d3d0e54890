import { mergeAttributes, Node } from '@tiptap/core';
import { LIVE_VALUE_NODE } from '../panel-json.js';
import { jsonFromHTML, panelIdAttribute } from '../node-attributes.js';
import { isPanelId } from '../widget/widget-id.js';
import { assertLiveValueFormat, DEFAULT_LIVE_VALUE_FORMAT, isLiveValueFormat, type LiveValueFormat } from './live-value-format.js';

export interface InsertLiveValueOptions {
  widgetId: string;
  output: string;
  format?: LiveValueFormat;
}

export interface LiveValueOptions {
  HTMLAttributes: Record<string, unknown>;
}

declare module '@tiptap/core' {
  interface Commands<ReturnType> {
    liveValue: {
      /** Inserts a live value at the cursor, showing one computed output of a widget on this panel. */
      insertLiveValue: (options: InsertLiveValueOptions) => ReturnType;
    };
  }
}

const OUTPUT_PATTERN = /^[A-Za-z][A-Za-z0-9_]{0,63}$/;

function assertOutput(value: unknown): void {
  if (typeof value !== 'string' || !OUTPUT_PATTERN.test(value)) throw new RangeError("A live value's output is the name of a computed result, such as \"criticalAngleDeg\".");
}

const formatFromHTML = (element: HTMLElement): LiveValueFormat => jsonFromHTML(element, 'data-format', isLiveValueFormat) ?? DEFAULT_LIVE_VALUE_FORMAT;

/**
 * A number in running text that is a widget's computed output, so a caption can never disagree
 * with the simulation beside it. An atom: the text is drawn, never typed.
 */
export const LiveValue = Node.create<LiveValueOptions>({
  name: LIVE_VALUE_NODE,
  group: 'inline',
  inline: true,
  atom: true,
  selectable: true,

  addOptions() {
    return { HTMLAttributes: {} };
  },

  addAttributes() {
    return {
      widgetId: panelIdAttribute('widgetId', 'data-widget-id'),
      output: {
        default: null,
        validate: assertOutput,
        parseHTML: (element: HTMLElement) => element.getAttribute('data-output'),
        renderHTML: (attributes: Record<string, unknown>) => ({ 'data-output': attributes.output }),
      },
      format: {
        default: DEFAULT_LIVE_VALUE_FORMAT,
        validate: assertLiveValueFormat,
        parseHTML: formatFromHTML,
        renderHTML: (attributes: Record<string, unknown>) => ({ 'data-format': JSON.stringify(attributes.format) }),
      },
    };
  },

  parseHTML() {
    return [
      {
        tag: 'span[data-live-value]',
        getAttrs: (element: HTMLElement) =>
          isPanelId(element.getAttribute('data-widget-id')) && OUTPUT_PATTERN.test(element.getAttribute('data-output') ?? '') ? null : false,
      },
    ];
  },

  renderHTML({ HTMLAttributes }) {
    return ['span', mergeAttributes({ 'data-live-value': '' }, this.options.HTMLAttributes, HTMLAttributes)];
  },

  addCommands() {
    return {
      insertLiveValue:
        ({ widgetId, output, format }) =>
          ({ commands }) =>
            commands.insertContent({ type: this.name, attrs: { widgetId, output, format: format ?? DEFAULT_LIVE_VALUE_FORMAT } }),
    };
  },
});

import { getSchema, type Extensions } from '@tiptap/core';
import type { Schema } from '@tiptap/pm/model';
import { Heading } from '@tiptap/extension-heading';
import { StarterKit } from '@tiptap/starter-kit';
import { LivePhrase } from './live-phrase/live-phrase.js';
import { LiveValue } from './live-value/live-value.js';
import { PanelImage } from './panel-image/panel-image.js';
import { PanelLink } from './panel-link/panel-link.js';
import { Widget } from './widget/widget.js';

/** A panel's headings: the story title is the screen's h1, so panel text starts at h2. */
export const PANEL_HEADING_LEVELS = [2, 3] as const;

/** Tiptap's `levels` option only limits input rules and commands; the schema check needs its own rule. */
export const PanelHeading = Heading.extend({
  addAttributes() {
    return {
      level: {
        default: PANEL_HEADING_LEVELS[0],
        rendered: false,
        validate: (level: unknown) => {
          if (!(PANEL_HEADING_LEVELS as readonly unknown[]).includes(level)) throw new RangeError(`A panel heading is level ${PANEL_HEADING_LEVELS.join(' or ')}.`);
        },
      },
    };
  },
}).configure({ levels: [...PANEL_HEADING_LEVELS] });

/**
 * The panel's StarterKit. Left out: code and code blocks (no visitor reads code), the horizontal
 * rule (a wall screen separates with space and headings), strike and underline (underline reads as
 * a link on a touchscreen, struck-out text has no place in finished interpretation).
 */
export const PanelStarterKit = StarterKit.configure({
  heading: false,
  code: false,
  codeBlock: false,
  horizontalRule: false,
  strike: false,
  underline: false,
  link: false,
});

/** The one extension list for a panel: the studio editor, the server's check and the renderer agree on it. */
export const panelExtensions: Extensions = [PanelStarterKit, PanelHeading, PanelLink, PanelImage, Widget, LiveValue, LivePhrase];

let schema: Schema | undefined;

/** The ProseMirror schema of a panel, built once. getSchema needs no DOM, so the server can call it. */
export function panelSchema(): Schema {
  schema ??= getSchema(panelExtensions);
  return schema;
}

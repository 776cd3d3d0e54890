/** Panel documents as stored and sent: Tiptap's JSON, with the node and mark names of `panelExtensions`. */
export interface PanelMarkJSON {
  type: string;
  attrs?: Record<string, unknown>;
}

export interface PanelNodeJSON {
  type: string;
  attrs?: Record<string, unknown>;
  content?: PanelNodeJSON[];
  marks?: PanelMarkJSON[];
  text?: string;
}

export interface PanelDocJSON extends PanelNodeJSON {
  type: 'doc';
}

/** A step from the document root to a node, as in `['content', 2, 'attrs', 'params']`. */
export type PanelPath = (string | number)[];

export interface PanelIssue {
  path: PanelPath;
  message: string;
}

export const WIDGET_NODE = 'widget';
export const LIVE_VALUE_NODE = 'liveValue';
export const LIVE_PHRASE_NODE = 'livePhrase';
export const PANEL_IMAGE_NODE = 'panelImage';
export const LINK_MARK = 'link';

/**
 * Visits every node depth first with its path from the root. Tolerates malformed input (the
 * server walks documents it has not checked yet) by skipping anything that is not a node object.
 */
export function visitPanelNodes(
  root: unknown,
  visit: (node: PanelNodeJSON, path: PanelPath) => void,
  path: PanelPath = [],
): void {
  if (!isNodeLike(root)) return;
  visit(root, path);
  if (!Array.isArray(root.content)) return;
  root.content.forEach((child, index) => visitPanelNodes(child, visit, [...path, 'content', index]));
}

export function isNodeLike(value: unknown): value is PanelNodeJSON {
  return typeof value === 'object' && value !== null && !Array.isArray(value) && typeof (value as { type?: unknown }).type === 'string';
}

/** JSON objects, including ProseMirror's prototype-less attrs; not arrays, dates or class instances. */
export function isPlainObject(value: unknown): value is Record<string, unknown> {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) return false;
  const prototype: unknown = Object.getPrototypeOf(value);
  return prototype === Object.prototype || prototype === null;
}

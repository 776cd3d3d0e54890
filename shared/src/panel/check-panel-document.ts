import { Node as ProseMirrorNode, type Schema } from '@tiptap/pm/model';
import { isWidgetType, widgetModule } from '../widgets/index.js';
import { isPanelHref, panelHrefMessage } from './panel-link/panel-href.js';
import { isNodeLike, isPlainObject, LINK_MARK, type PanelDocJSON, type PanelIssue, type PanelPath } from './panel-json.js';
import { panelSchema } from './panel-extensions.js';
import { livePhrasesIn, widgetsIn } from './panel-queries.js';

export type PanelDocumentCheck = { ok: true; doc: PanelDocJSON } | { ok: false; errors: PanelIssue[] };

const MAX_DEPTH = 32;

const reason = (error: unknown) => (error instanceof Error ? error.message : String(error));

/** Walks the raw JSON first so every refusal names where it is; ProseMirror's own errors do not. */
function shapeIssues(schema: Schema, json: unknown, path: PanelPath, depth: number): PanelIssue[] {
  if (!isPlainObject(json) || typeof json.type !== 'string') return [{ path, message: 'Expected a node with a "type".' }];
  if (depth > MAX_DEPTH) return [{ path, message: `Content is nested more than ${MAX_DEPTH} levels deep.` }];
  const issues: PanelIssue[] = [];
  const unexpected = Object.keys(json).filter((key) => !['type', 'attrs', 'content', 'marks', 'text'].includes(key));
  for (const key of unexpected) issues.push({ path: [...path, key], message: `"${key}" is not part of a panel node.` });

  const nodeType = schema.nodes[json.type];
  if (!nodeType || !Object.hasOwn(schema.nodes, json.type)) return [...issues, { path: [...path, 'type'], message: `"${json.type}" is not something a panel can contain.` }];
  issues.push(...attrIssues(nodeType.spec.attrs ?? {}, json.attrs, [...path, 'attrs']));

  if (json.marks !== undefined) {
    if (!Array.isArray(json.marks)) issues.push({ path: [...path, 'marks'], message: 'Marks must be a list.' });
    else json.marks.forEach((mark, index) => issues.push(...markIssues(schema, mark, [...path, 'marks', index])));
  }
  if (json.content !== undefined) {
    if (!Array.isArray(json.content)) issues.push({ path: [...path, 'content'], message: 'Content must be a list.' });
    else json.content.forEach((child, index) => issues.push(...shapeIssues(schema, child, [...path, 'content', index], depth + 1)));
  }
  return issues;
}

function attrIssues(declared: Record<string, unknown>, attrs: unknown, path: PanelPath): PanelIssue[] {
  if (attrs === undefined) return [];
  if (!isPlainObject(attrs)) return [{ path, message: 'Attributes must be an object.' }];
  return Object.keys(attrs)
    .filter((name) => !Object.hasOwn(declared, name))
    .map((name) => ({ path: [...path, name], message: `"${name}" is not an attribute this node can have.` }));
}

function markIssues(schema: Schema, mark: unknown, path: PanelPath): PanelIssue[] {
  if (!isPlainObject(mark) || typeof mark.type !== 'string') return [{ path, message: 'Expected a mark with a "type".' }];
  const markType = Object.hasOwn(schema.marks, mark.type) ? schema.marks[mark.type] : undefined;
  if (!markType) return [{ path: [...path, 'type'], message: `"${mark.type}" is not a kind of text formatting a panel can use.` }];
  const issues = attrIssues(markType.spec.attrs ?? {}, mark.attrs, [...path, 'attrs']);
  if (mark.type === LINK_MARK && !isPanelHref(isPlainObject(mark.attrs) ? mark.attrs.href : undefined)) {
    issues.push({ path: [...path, 'attrs', 'href'], message: panelHrefMessage });
  }
  return issues;
}

/** Where ProseMirror's check failed: the deepest node that fails on its own while its children pass. */
function locateSchemaIssue(schema: Schema, json: PanelDocJSON): PanelIssue | null {
  const failure = (node: unknown): string | null => {
    try {
      ProseMirrorNode.fromJSON(schema, node).check();
      return null;
    } catch (error) {
      return reason(error);
    }
  };
  const rootFailure = failure(json);
  if (rootFailure === null) return null;
  let path: PanelPath = [];
  let node: unknown = json;
  let message = rootFailure;
  for (;;) {
    const children: unknown[] = isNodeLike(node) && Array.isArray(node.content) ? node.content : [];
    const index = children.findIndex((child) => failure(child) !== null);
    if (index === -1) break;
    node = children[index];
    message = failure(node) ?? message;
    path = [...path, 'content', index];
  }
  return { path, message };
}

function widgetIssues(doc: PanelDocJSON): PanelIssue[] {
  const issues: PanelIssue[] = [];
  const seen = new Set<string>();
  for (const { path, widgetType, widgetId, params } of widgetsIn(doc)) {
    if (seen.has(widgetId)) issues.push({ path: [...path, 'attrs', 'widgetId'], message: `Another widget on this panel already has the id ${widgetId}.` });
    seen.add(widgetId);
    if (!isWidgetType(widgetType)) {
      issues.push({ path: [...path, 'attrs', 'widgetType'], message: `"${widgetType}" is not a widget Mantlepiece has.` });
      continue;
    }
    const checked = widgetModule(widgetType).validate(params);
    if (!checked.ok) issues.push(...checked.errors.map((error) => ({ path: [...path, 'attrs', 'params', ...error.path], message: error.message })));
  }
  return issues;
}

/** A live phrase's id names its translation units, so two phrases of one panel cannot share one. */
function livePhraseIdIssues(doc: PanelDocJSON): PanelIssue[] {
  const seen = new Set<string>();
  return livePhrasesIn(doc).flatMap(({ path, phraseId }) => {
    if (!seen.has(phraseId)) {
      seen.add(phraseId);
      return [];
    }
    return [{ path: [...path, 'attrs', 'phraseId'], message: `Another live phrase on this panel already has the id ${phraseId}.` }];
  });
}

/**
 * The server's check of a panel document. The schema comes from `panelExtensions`, the same list
 * the studio editor runs, so editor and server cannot disagree on what a panel may contain.
 * Dangling live values are not refused here (a curator may delete a widget mid-edit and must be
 * able to save); preflight blocks them with `danglingLiveValues`.
 */
export function checkPanelDocument(json: unknown): PanelDocumentCheck {
  const schema = panelSchema();
  const shape = shapeIssues(schema, json, [], 0);
  if (shape.length > 0) return { ok: false, errors: shape };
  const doc = json as PanelDocJSON;
  if (doc.type !== schema.topNodeType.name) return { ok: false, errors: [{ path: ['type'], message: 'A panel document starts with a "doc" node.' }] };

  const schemaIssue = locateSchemaIssue(schema, doc);
  if (schemaIssue) return { ok: false, errors: [schemaIssue] };

  const widgets = [...widgetIssues(doc), ...livePhraseIdIssues(doc)];
  if (widgets.length > 0) return { ok: false, errors: widgets };
  // Round-tripped through the schema so defaults are filled in and the stored JSON is canonical.
  return { ok: true, doc: ProseMirrorNode.fromJSON(schema, doc).toJSON() as PanelDocJSON };
}

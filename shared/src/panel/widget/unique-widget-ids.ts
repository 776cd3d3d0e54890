import { Plugin, PluginKey, type Transaction } from '@tiptap/pm/state';
import type { Node as ProseMirrorNode } from '@tiptap/pm/model';
import { newWidgetId } from './widget-id.js';

/** One key per node type, so widgets and live phrases can each run the plugin in one editor. */
const keys = new Map<string, PluginKey>();

function idPositions(doc: ProseMirrorNode, nodeName: string, idAttr: string): Map<string, number> {
  const positions = new Map<string, number>();
  doc.descendants((node, pos) => {
    if (node.type.name !== nodeName) return true;
    if (typeof node.attrs[idAttr] === 'string' && !positions.has(node.attrs[idAttr])) positions.set(node.attrs[idAttr], pos);
    return false;
  });
  return positions;
}

/**
 * Live values find their widget by id, so a pasted or duplicated widget must get a fresh id. The
 * widget that was already in the document keeps its id (and its live values); the copy is renamed.
 * Live phrases use the same rule for their own ids (`idAttr`), which name their translation units.
 */
export function uniqueWidgetIds(nodeName: string, idAttr = 'widgetId', newId: () => string = newWidgetId): Plugin {
  let key = keys.get(nodeName);
  if (!key) keys.set(nodeName, (key = new PluginKey(`unique-${nodeName}-ids`)));
  return new Plugin({
    key,
    appendTransaction(transactions: readonly Transaction[], oldState, newState) {
      if (!transactions.some((tr) => tr.docChanged)) return null;
      const before = idPositions(oldState.doc, nodeName, idAttr);
      const owners = new Map<string, number>();
      for (const [id, pos] of before) {
        const mapped = transactions.reduce<number | null>((at, tr) => {
          if (at === null) return null;
          const result = tr.mapping.mapResult(at);
          return result.deleted ? null : result.pos;
        }, pos);
        if (mapped !== null) owners.set(id, mapped);
      }
      const seen = new Set<string>();
      const renames: { pos: number }[] = [];
      newState.doc.descendants((node, pos) => {
        if (node.type.name !== nodeName) return true;
        const id: unknown = node.attrs[idAttr];
        const owned = typeof id === 'string' && owners.has(id) ? owners.get(id) === pos : true;
        if (typeof id !== 'string' || seen.has(id) || !owned) renames.push({ pos });
        else seen.add(id);
        return false;
      });
      if (renames.length === 0) return null;
      const tr = newState.tr;
      for (const { pos } of renames) tr.setNodeAttribute(pos, idAttr, newId());
      return tr;
    },
  });
}

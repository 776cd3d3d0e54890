import { Plugin, PluginKey, type Transaction } from '@tiptap/pm/state';
import type { Node as ProseMirrorNode } from '@tiptap/pm/model';
import { newWidgetId } from './widget-id.js';

export const uniqueWidgetIdsKey = new PluginKey('uniqueWidgetIds');

function widgetPositions(doc: ProseMirrorNode, nodeName: string): Map<string, number> {
  const positions = new Map<string, number>();
  doc.descendants((node, pos) => {
    if (node.type.name !== nodeName) return true;
    if (typeof node.attrs.widgetId === 'string' && !positions.has(node.attrs.widgetId)) positions.set(node.attrs.widgetId, pos);
    return false;
  });
  return positions;
}

/**
 * Live values find their widget by id, so a pasted or duplicated widget must get a fresh id. The
 * widget that was already in the document keeps its id (and its live values); the copy is renamed.
 */
export function uniqueWidgetIds(nodeName: string): Plugin {
  return new Plugin({
    key: uniqueWidgetIdsKey,
    appendTransaction(transactions: readonly Transaction[], oldState, newState) {
      if (!transactions.some((tr) => tr.docChanged)) return null;
      const before = widgetPositions(oldState.doc, nodeName);
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
        const id = node.attrs.widgetId;
        const owned = typeof id === 'string' && owners.has(id) ? owners.get(id) === pos : true;
        if (typeof id !== 'string' || seen.has(id) || !owned) renames.push({ pos });
        else seen.add(id);
        return false;
      });
      if (renames.length === 0) return null;
      const tr = newState.tr;
      for (const { pos } of renames) tr.setNodeAttribute(pos, 'widgetId', newWidgetId());
      return tr;
    },
  });
}

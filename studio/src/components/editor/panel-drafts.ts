import type { PanelDocJSON } from '@mantlepiece/shared';

/** A panel document typed but not yet saved, and the version it was typed on top of. */
export interface PanelDraft {
  doc: PanelDocJSON;
  baseVersion: number;
}

const key = (panelId: number) => `mantlepiece.panelDraft.${panelId}`;

/**
 * Unsaved panel text also lives in sessionStorage, so a reload, a crash of the tab's page or a
 * failed save loses nothing; it stays until the server has accepted that text.
 */
export function readPanelDraft(panelId: number): PanelDraft | null {
  try {
    const parsed: unknown = JSON.parse(sessionStorage.getItem(key(panelId)) ?? 'null');
    if (typeof parsed !== 'object' || parsed === null) return null;
    const { doc, baseVersion } = parsed as Partial<PanelDraft>;
    return doc && typeof doc === 'object' && doc.type === 'doc' && typeof baseVersion === 'number' ? { doc, baseVersion } : null;
  } catch {
    return null;
  }
}

export function writePanelDraft(panelId: number, draft: PanelDraft): void {
  try {
    sessionStorage.setItem(key(panelId), JSON.stringify(draft));
  } catch {
    // Storage full or refused: the draft still lives in memory until it is saved.
  }
}

export function clearPanelDraft(panelId: number): void {
  try {
    sessionStorage.removeItem(key(panelId));
  } catch {
    // Nothing stored, nothing to clear.
  }
}

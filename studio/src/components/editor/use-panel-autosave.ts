import { useCallback, useEffect, useLayoutEffect, useRef, useState } from 'react';
import { checkPanelDocument, type PanelConflictBody, type PanelDocJSON, type PanelIssue, type PanelView } from '@mantlepiece/shared';
import { ApiError } from '../../api/client';
import { savePanelDoc } from '../../api/stories';
import { clearPanelDraft, readPanelDraft, writePanelDraft } from './panel-drafts';

/** A pause this long in typing sends the panel to the server. */
export const AUTOSAVE_DELAY_MS = 1200;

export type SaveState =
  | { status: 'saved' }
  | { status: 'pending' }
  | { status: 'saving' }
  /** Someone else saved first: their document and version, to compare and choose. */
  | { status: 'conflict'; theirs: PanelConflictBody }
  /** The document breaks a rule the server also checks (a widget set outside its range); not sent. */
  | { status: 'invalid'; issues: PanelIssue[] }
  | { status: 'error'; error: unknown };

export interface PanelAutosave {
  state: SaveState;
  /** The document the editor opens with: an unsaved draft from this tab if there is one. */
  initialDoc: PanelDocJSON;
  restoredDraft: boolean;
  change: (doc: PanelDocJSON) => void;
  saveNow: () => void;
  /** Conflict: keep what this curator wrote, saving it over the other version. */
  keepMine: () => void;
  /** Conflict: take the other version; the caller puts it in the editor. */
  takeTheirs: () => PanelDocJSON | null;
}

function isConflict(body: unknown): body is PanelConflictBody {
  return typeof body === 'object' && body !== null && typeof (body as PanelConflictBody).currentVersion === 'number' && typeof (body as PanelConflictBody).doc === 'object';
}

/**
 * Saves a panel after each pause in typing, with optimistic concurrency on its version. Until the
 * server accepts a document it stays in memory and in sessionStorage, whatever went wrong.
 */
export function usePanelAutosave(panel: PanelView, onSaved: (doc: PanelDocJSON, version: number) => void): PanelAutosave {
  const [draft] = useState(() => {
    const stored = readPanelDraft(panel.id);
    return stored && JSON.stringify(stored.doc) !== JSON.stringify(panel.doc) ? stored : null;
  });
  const version = useRef(draft?.baseVersion ?? panel.version);
  const unsaved = useRef<PanelDocJSON | null>(draft?.doc ?? null);
  const inFlight = useRef(false);
  const again = useRef(false);
  const timer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  const [state, setState] = useState<SaveState>(draft ? { status: 'pending' } : { status: 'saved' });
  const conflicted = useRef(false);
  const savedCallback = useRef(onSaved);
  useLayoutEffect(() => {
    savedCallback.current = onSaved;
  });

  const save = useCallback(async () => {
    clearTimeout(timer.current);
    const doc = unsaved.current;
    if (!doc || conflicted.current) return;
    if (inFlight.current) {
      again.current = true;
      return;
    }
    const check = checkPanelDocument(doc);
    if (!check.ok) {
      setState({ status: 'invalid', issues: check.errors });
      return;
    }
    inFlight.current = true;
    setState({ status: 'saving' });
    try {
      const answer = await savePanelDoc(panel.id, doc, version.current);
      version.current = answer.version;
      savedCallback.current(doc, answer.version);
      if (unsaved.current === doc) {
        unsaved.current = null;
        clearPanelDraft(panel.id);
        setState({ status: 'saved' });
      } else if (unsaved.current) {
        writePanelDraft(panel.id, { doc: unsaved.current, baseVersion: answer.version });
        again.current = true;
      }
    } catch (error) {
      if (error instanceof ApiError && error.status === 409 && isConflict(error.body)) {
        conflicted.current = true;
        setState({ status: 'conflict', theirs: error.body });
      } else if (error instanceof ApiError && error.status === 422) {
        setState({ status: 'invalid', issues: error.errors });
      } else {
        setState({ status: 'error', error });
      }
    } finally {
      inFlight.current = false;
      if (again.current) {
        again.current = false;
        void save();
      }
    }
  }, [panel.id]);

  const change = useCallback(
    (doc: PanelDocJSON) => {
      unsaved.current = doc;
      writePanelDraft(panel.id, { doc, baseVersion: version.current });
      if (conflicted.current) return;
      setState((current) => (current.status === 'saving' ? current : { status: 'pending' }));
      clearTimeout(timer.current);
      timer.current = setTimeout(() => void save(), AUTOSAVE_DELAY_MS);
    },
    [panel.id, save],
  );

  // A restored draft goes to the server at once; if the panel moved on meanwhile, that is a conflict.
  useEffect(() => {
    if (draft) void save();
  }, [draft, save]);

  // Leaving the panel (another panel, another page) sends what is pending instead of waiting.
  useEffect(() => () => void save(), [save]);

  const keepMine = useCallback(() => {
    if (state.status !== 'conflict') return;
    version.current = state.theirs.currentVersion;
    conflicted.current = false;
    void save();
  }, [state, save]);

  const takeTheirs = useCallback(() => {
    if (state.status !== 'conflict') return null;
    version.current = state.theirs.currentVersion;
    conflicted.current = false;
    unsaved.current = null;
    clearPanelDraft(panel.id);
    savedCallback.current(state.theirs.doc, state.theirs.currentVersion);
    setState({ status: 'saved' });
    return state.theirs.doc;
  }, [state, panel.id]);

  return {
    state,
    initialDoc: draft?.doc ?? panel.doc,
    restoredDraft: draft !== null,
    change,
    saveNow: () => void save(),
    keepMine,
    takeTheirs,
  };
}

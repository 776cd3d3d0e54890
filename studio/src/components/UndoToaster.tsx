import { useCallback, type ReactElement } from 'react';
import { Link, Toast, Toaster, ToastTitle, useToastController } from '@fluentui/react-components';
import { DELETION_GRACE_MS } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { describeError } from './forms/describe-error';

const TOASTER_ID = 'studio-undo';

/** How long Undo is offered: a moment to notice, never longer than the server keeps the deleted row. */
const UNDO_OFFERED_MS = Math.min(30_000, DELETION_GRACE_MS);

/** Where deletions offer Undo: once in the shell, so a toast outlives the page it came from (an image's page goes on delete). */
export function UndoToaster() {
  return <Toaster toasterId={TOASTER_ID} position="bottom-end" pauseOnHover pauseOnWindowBlur />;
}

/** What a toast says, as an i18n key and its values, so the words follow the studio's language while it shows. */
export interface ToastWords {
  key: 'undo.panelDeleted' | 'undo.imageDeleted' | 'undo.restored';
  values?: Record<string, string | number>;
}

/** A toast's title, translated at render time: switching the language while it shows re-words it. */
function ToastWordsTitle({ words, action }: { words: ToastWords; action?: ReactElement }) {
  const { t } = useTranslation();
  return <ToastTitle action={action}>{t(words.key, words.values)}</ToastTitle>;
}

/** Undo, in the studio's current language. */
function UndoAction({ onClick }: { onClick: () => void }) {
  const { t } = useTranslation();
  return <Link as="button" onClick={onClick}>{t('undo.action')}</Link>;
}

/** Why a restore failed, in the studio's current language. */
function RestoreFailedTitle({ error }: { error: unknown }) {
  const { t } = useTranslation();
  return <ToastTitle>{t('undo.failed', { problem: describeError(t, error) })}</ToastTitle>;
}

/** Tells that something was deleted and offers Undo for a while; `undo` restores it on the server. */
export function useOfferUndo() {
  const { dispatchToast, dismissToast } = useToastController(TOASTER_ID);
  return useCallback((message: ToastWords, undo: () => Promise<unknown>) => {
    const toastId = `undo-${Date.now()}-${Math.random()}`;
    const restore = () => {
      dismissToast(toastId);
      undo().then(
        () => dispatchToast(<Toast><ToastWordsTitle words={{ key: 'undo.restored' }} /></Toast>, { intent: 'success' }),
        (error: unknown) => dispatchToast(<Toast><RestoreFailedTitle error={error} /></Toast>, { intent: 'error', timeout: 10_000 }),
      );
    };
    dispatchToast(
      <Toast data-undo-toast>
        <ToastWordsTitle words={message} action={<UndoAction onClick={restore} />} />
      </Toast>,
      { toastId, intent: 'info', timeout: UNDO_OFFERED_MS },
    );
  }, [dispatchToast, dismissToast]);
}

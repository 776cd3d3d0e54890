import { useCallback } from 'react';
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

/** Tells that something was deleted and offers Undo for a while; `undo` restores it on the server. */
export function useOfferUndo() {
  const { t } = useTranslation();
  const { dispatchToast, dismissToast } = useToastController(TOASTER_ID);
  return useCallback((message: string, undo: () => Promise<unknown>) => {
    const toastId = `undo-${Date.now()}-${Math.random()}`;
    const restore = () => {
      dismissToast(toastId);
      undo().then(
        () => dispatchToast(<Toast><ToastTitle>{t('undo.restored')}</ToastTitle></Toast>, { intent: 'success' }),
        (error: unknown) => dispatchToast(<Toast><ToastTitle>{t('undo.failed', { problem: describeError(t, error) })}</ToastTitle></Toast>, { intent: 'error', timeout: 10_000 }),
      );
    };
    dispatchToast(
      <Toast data-undo-toast>
        <ToastTitle action={<Link as="button" onClick={restore}>{t('undo.action')}</Link>}>{message}</ToastTitle>
      </Toast>,
      { toastId, intent: 'info', timeout: UNDO_OFFERED_MS },
    );
  }, [t, dispatchToast, dismissToast]);
}

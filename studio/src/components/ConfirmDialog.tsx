import type { ReactNode } from 'react';
import { Button, Dialog, DialogActions, DialogBody, DialogContent, DialogSurface, DialogTitle } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import { FormAlert } from './forms/FormAlert';

/** "Delete this?" before anything is destroyed; the server's refusal, if any, is shown inside. */
export function ConfirmDialog({ title, children, confirmLabel, pending, problem, onConfirm, onCancel }: {
  title: string;
  children: ReactNode;
  confirmLabel: string;
  pending: boolean;
  problem: string | null;
  onConfirm: () => void;
  onCancel: () => void;
}) {
  const { t } = useTranslation();
  return (
    <Dialog open modalType="alert" onOpenChange={(_event, data) => { if (!data.open) onCancel(); }}>
      <DialogSurface>
        <DialogBody>
          <DialogTitle>{title}</DialogTitle>
          <DialogContent>
            {children}
            {problem ? <FormAlert intent="error">{problem}</FormAlert> : null}
          </DialogContent>
          <DialogActions>
            <Button appearance="secondary" onClick={onCancel}>{t('common.cancel')}</Button>
            <Button appearance="primary" onClick={onConfirm} disabled={pending}>{confirmLabel}</Button>
          </DialogActions>
        </DialogBody>
      </DialogSurface>
    </Dialog>
  );
}

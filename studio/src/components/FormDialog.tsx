import type { FormEvent, ReactNode } from 'react';
import { Button, Dialog, DialogActions, DialogBody, DialogContent, DialogSurface, DialogTitle, makeStyles, Text, tokens } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';

const useStyles = makeStyles({
  content: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  intro: { color: tokens.colorNeutralForeground2 },
});

/**
 * A dialog around one form: Enter or the primary button submits, Cancel or Escape closes. The
 * browser's own checks are off (`noValidate`) so each form shows its messages by its fields.
 */
export function FormDialog({ title, intro, submitLabel, pending = false, extraActions, onSubmit, onClose, children }: {
  title: string;
  intro?: string;
  submitLabel: string;
  pending?: boolean;
  /** Buttons before Cancel, such as removing what the form sets. */
  extraActions?: ReactNode;
  onSubmit: () => void;
  onClose: () => void;
  children: ReactNode;
}) {
  const { t } = useTranslation();
  const styles = useStyles();
  const submit = (event: FormEvent) => {
    event.preventDefault();
    onSubmit();
  };
  return (
    <Dialog open modalType="modal" onOpenChange={(_event, data) => { if (!data.open) onClose(); }}>
      <DialogSurface>
        <form onSubmit={submit} noValidate>
          <DialogBody>
            <DialogTitle>{title}</DialogTitle>
            <DialogContent className={styles.content}>
              {intro ? <Text as="p" className={styles.intro}>{intro}</Text> : null}
              {children}
            </DialogContent>
            <DialogActions>
              {extraActions}
              <Button appearance="secondary" onClick={onClose}>{t('common.cancel')}</Button>
              <Button type="submit" appearance="primary" disabled={pending}>{submitLabel}</Button>
            </DialogActions>
          </DialogBody>
        </form>
      </DialogSurface>
    </Dialog>
  );
}

import { useState, type FormEvent } from 'react';
import { Button, Dialog, DialogActions, DialogBody, DialogContent, DialogSurface, DialogTitle, Field, Input } from '@fluentui/react-components';
import type { Editor } from '@tiptap/react';
import { isPanelHref } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';

/** Sets, changes or removes the link on the selection; only http, https and mailto, as the server allows. */
export function LinkDialog({ editor, onClose }: { editor: Editor; onClose: () => void }) {
  const { t } = useTranslation();
  const current = editor.getAttributes('link').href as string | undefined;
  const [href, setHref] = useState(current ?? 'https://');
  const [problem, setProblem] = useState<string | undefined>();

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const value = href.trim();
    if (!isPanelHref(value)) {
      setProblem(t('editor.linkInvalid'));
      return;
    }
    editor.chain().focus().extendMarkRange('link').setLink({ href: value }).run();
    onClose();
  };
  const remove = () => {
    editor.chain().focus().extendMarkRange('link').unsetLink().run();
    onClose();
  };

  return (
    <Dialog open modalType="modal" onOpenChange={(_event, data) => { if (!data.open) onClose(); }}>
      <DialogSurface>
        <form onSubmit={submit} noValidate>
          <DialogBody>
            <DialogTitle>{current ? t('editor.linkEditTitle') : t('editor.linkAddTitle')}</DialogTitle>
            <DialogContent>
              <Field label={t('editor.linkAddress')} hint={t('editor.linkHint')} validationMessage={problem}>
                <Input type="url" value={href} onChange={(_event, data) => setHref(data.value)} autoFocus />
              </Field>
            </DialogContent>
            <DialogActions>
              {current ? <Button onClick={remove}>{t('editor.linkRemove')}</Button> : null}
              <Button appearance="secondary" onClick={onClose}>{t('common.cancel')}</Button>
              <Button type="submit" appearance="primary">{t('editor.linkApply')}</Button>
            </DialogActions>
          </DialogBody>
        </form>
      </DialogSurface>
    </Dialog>
  );
}

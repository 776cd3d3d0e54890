import { useState } from 'react';
import { Button, Field, Input } from '@fluentui/react-components';
import type { Editor } from '@tiptap/react';
import { isPanelHref } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { FormDialog } from '../FormDialog';

/** Sets, changes or removes the link on the selection; only http, https and mailto, as the server allows. */
export function LinkDialog({ editor, onClose }: { editor: Editor; onClose: () => void }) {
  const { t } = useTranslation();
  const current = editor.getAttributes('link').href as string | undefined;
  const [href, setHref] = useState(current ?? 'https://');
  const [problem, setProblem] = useState<string | undefined>();

  const submit = () => {
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
    <FormDialog
      title={current ? t('editor.linkEditTitle') : t('editor.linkAddTitle')}
      submitLabel={t('editor.linkApply')}
      extraActions={current ? <Button onClick={remove}>{t('editor.linkRemove')}</Button> : null}
      onSubmit={submit}
      onClose={onClose}
    >
      <Field label={t('editor.linkAddress')} hint={t('editor.linkHint')} validationMessage={problem}>
        <Input type="url" value={href} onChange={(_event, data) => setHref(data.value)} autoFocus />
      </Field>
    </FormDialog>
  );
}

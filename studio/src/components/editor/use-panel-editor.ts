import { useMemo } from 'react';
import { Placeholder } from '@tiptap/extensions';
import { useEditor } from '@tiptap/react';
import type { PanelDocJSON } from '@mantlepiece/shared';
import { panelEditorExtensions, type ResolveMedia } from '@mantlepiece/shared/react';
import { useTranslation } from 'react-i18next';
import { CommentHighlights } from './comment-highlights';

/**
 * The Tiptap editor of one panel: the shared extension list (the server checks documents against
 * the same one) with the shared React node views, so widgets and live values draw as on the kiosk,
 * plus the studio's marks over words that review comments are about and a hint in an empty panel.
 */
export function usePanelEditor({ initialDoc, locale, resolveMedia, onChange }: {
  initialDoc: PanelDocJSON;
  locale: string;
  resolveMedia: ResolveMedia;
  onChange: (doc: PanelDocJSON) => void;
}) {
  const { t } = useTranslation();
  const missingMediaLabel = t('editor.missingImage');
  const emptyPanel = t('editor.emptyPanel');
  const trying = t('widgetTrial.trying');
  const keep = t('widgetTrial.keep');
  const reset = t('widgetTrial.reset');
  const trialValue = t('widgetTrial.trialValue');
  const extensions = useMemo(
    // The placeholder is the studio's alone: it is drawn by CSS, never stored in the document.
    () => [
      ...panelEditorExtensions({ locale, resolveMedia, missingMediaLabel, widgetTrialLabels: { trying, keep, reset, trialValue } }),
      CommentHighlights,
      Placeholder.configure({ placeholder: emptyPanel }),
    ],
    [locale, resolveMedia, missingMediaLabel, emptyPanel, trying, keep, reset, trialValue],
  );
  return useEditor(
    {
      extensions,
      content: initialDoc,
      immediatelyRender: true,
      shouldRerenderOnTransaction: false,
      editorProps: { attributes: { 'aria-label': t('editor.area'), 'aria-multiline': 'true', role: 'textbox', lang: locale, spellcheck: 'true' } },
      onUpdate: ({ editor }) => onChange(editor.getJSON() as PanelDocJSON),
    },
    [extensions],
  );
}

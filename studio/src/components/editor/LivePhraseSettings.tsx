import { Field, Input, makeStyles, MessageBar, MessageBarBody, Text, tokens } from '@fluentui/react-components';
import type { Editor } from '@tiptap/react';
import { MAX_WORDING_LENGTH, phraseStatesOf, widgetsIn, type PanelDocJSON, type PanelLivePhraseRef, type WidgetType } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { stateWord } from './live-phrase-states';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  muted: { color: tokens.colorNeutralForeground3 },
});

/** One wording per state of the phrase's widget; each change goes straight into the document. */
export function LivePhraseSettings({ editor, phrase, doc }: { editor: Editor; phrase: PanelLivePhraseRef; doc: PanelDocJSON }) {
  const { t, i18n } = useTranslation();
  const styles = useStyles();
  const widget = widgetsIn(doc).find((candidate) => candidate.widgetId === phrase.widgetId);
  const states = widget ? phraseStatesOf(widget) : [];
  const uiLocale = i18n.resolvedLanguage ?? 'en';
  return (
    <section className={styles.root} aria-label={t('livePhrase.title')} data-testid="live-phrase-settings">
      <Text weight="semibold">{t('livePhrase.title')}</Text>
      <Text className={styles.muted}>{t('livePhrase.intro', { widget: widget ? t(`widgetTypes.${widget.widgetType as WidgetType}`) : phrase.widgetId })}</Text>
      {states.length === 0 ? (
        <MessageBar intent="warning"><MessageBarBody>{t('livePhrase.noWidget')}</MessageBarBody></MessageBar>
      ) : (
        states.map((state) => (
          <Field key={state} label={t('livePhrase.wordingFor', { state: stateWord(state, uiLocale) })}>
            <Input
              value={phrase.wordings[state] ?? ''}
              maxLength={MAX_WORDING_LENGTH}
              data-state={state}
              onChange={(_event, data) => editor.commands.setLivePhraseWordings(phrase.phraseId, { ...phrase.wordings, [state]: data.value.replace(/[\r\n]/g, ' ') })}
            />
          </Field>
        ))
      )}
    </section>
  );
}

import { Button, makeStyles, MessageBar, MessageBarActions, MessageBarBody, MessageBarTitle, Text, tokens } from '@fluentui/react-components';
import type { Placeholder, TranslationConflictBody } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { PlaceholderText } from './PlaceholderText';

const useStyles = makeStyles({
  body: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  sides: { display: 'grid', gridTemplateColumns: 'repeat(auto-fit, minmax(12rem, 1fr))', gap: tokens.spacingHorizontalM },
  label: { color: tokens.colorNeutralForeground3 },
});

/** A save refused with 409: the version someone else saved beside the translator's, and the two ways on. */
export function UnitConflict({ conflict, mine, placeholders, locale, dir, onTakeTheirs, onKeepMine }: {
  conflict: TranslationConflictBody;
  mine: string;
  placeholders: Placeholder[];
  locale: string;
  dir: 'ltr' | 'rtl';
  onTakeTheirs: () => void;
  onKeepMine: () => void;
}) {
  const { t } = useTranslation();
  const styles = useStyles();
  const side = (label: string, text: string | null) => (
    <div>
      <Text size={200} weight="semibold" className={styles.label}>{label}</Text>
      {text ? <PlaceholderText text={text} placeholders={placeholders} locale={locale} dir={dir} /> : <Text as="p" italic>{t('unitEditor.cleared')}</Text>}
    </div>
  );
  return (
    <MessageBar intent="warning" layout="multiline" role="alert" data-unit-conflict>
      <MessageBarBody className={styles.body}>
        <MessageBarTitle>{t('unitEditor.conflictTitle')}</MessageBarTitle>
        <Text as="p">{t('unitEditor.conflictBody', { version: conflict.currentVersion })}</Text>
        <div className={styles.sides}>
          {side(t('unitEditor.theirs'), conflict.text)}
          {side(t('unitEditor.yours'), mine)}
        </div>
      </MessageBarBody>
      <MessageBarActions>
        <Button onClick={onTakeTheirs}>{t('unitEditor.takeTheirs')}</Button>
        <Button appearance="primary" onClick={onKeepMine}>{t('unitEditor.keepMine')}</Button>
      </MessageBarActions>
    </MessageBar>
  );
}

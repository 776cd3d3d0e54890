import { Button, Dialog, DialogActions, DialogBody, DialogContent, DialogSurface, DialogTitle, makeStyles, mergeClasses, Text, tokens } from '@fluentui/react-components';
import { panelText, type PanelConflictBody, type PanelDocJSON } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { lineDiff } from './line-diff';

const useStyles = makeStyles({
  content: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  diff: { margin: 0, padding: tokens.spacingHorizontalM, listStyle: 'none', maxHeight: '50vh', overflow: 'auto', border: `1px solid ${tokens.colorNeutralStroke2}`, borderRadius: tokens.borderRadiusMedium, backgroundColor: tokens.colorNeutralBackground2, display: 'flex', flexDirection: 'column', gap: '2px' },
  line: { padding: `2px ${tokens.spacingHorizontalS}`, borderRadius: tokens.borderRadiusSmall, whiteSpace: 'pre-wrap' },
  theirs: { backgroundColor: tokens.colorPaletteBlueBackground2 },
  yours: { backgroundColor: tokens.colorPaletteMarigoldBackground2 },
  marker: { fontWeight: tokens.fontWeightSemibold, marginRight: tokens.spacingHorizontalS },
});

/**
 * Someone saved this panel while this curator was writing. Shows both texts line by line, then lets
 * them take the other version or keep their own (saved again on top of the current version).
 */
export function ConflictDialog({ theirs, mine, locale, onKeepMine, onTakeTheirs, onClose }: {
  theirs: PanelConflictBody;
  mine: PanelDocJSON;
  locale: string;
  onKeepMine: () => void;
  onTakeTheirs: () => void;
  onClose: () => void;
}) {
  const { t } = useTranslation();
  const styles = useStyles();
  const lines = lineDiff(panelText(theirs.doc, { locale }), panelText(mine, { locale }));
  const same = lines.every((line) => line.kind === 'same');
  return (
    <Dialog open modalType="alert" onOpenChange={(_event, data) => { if (!data.open) onClose(); }}>
      <DialogSurface>
        <DialogBody>
          <DialogTitle>{t('editor.conflict.title')}</DialogTitle>
          <DialogContent className={styles.content}>
            <Text as="p">{t('editor.conflict.body')}</Text>
            {same ? <Text as="p">{t('editor.conflict.sameText')}</Text> : null}
            <ul className={styles.diff} aria-label={t('editor.conflict.differences')}>
              {lines.map((line, index) => (
                <li key={index} className={mergeClasses(styles.line, line.kind === 'theirs' && styles.theirs, line.kind === 'yours' && styles.yours)}>
                  {line.kind === 'same' ? null : <span className={styles.marker}>{line.kind === 'theirs' ? t('editor.conflict.theirs') : t('editor.conflict.yours')}</span>}
                  {line.text}
                </li>
              ))}
            </ul>
          </DialogContent>
          <DialogActions>
            <Button onClick={onTakeTheirs}>{t('editor.conflict.takeTheirs')}</Button>
            <Button appearance="primary" onClick={onKeepMine}>{t('editor.conflict.keepMine')}</Button>
          </DialogActions>
        </DialogBody>
      </DialogSurface>
    </Dialog>
  );
}

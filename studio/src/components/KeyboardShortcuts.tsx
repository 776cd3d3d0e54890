import { Button, Dialog, DialogActions, DialogBody, DialogContent, DialogSurface, DialogTitle, makeStyles, tokens } from '@fluentui/react-components';
import { KeyboardRegular } from '@fluentui/react-icons';
import { Fragment, useEffect, useState } from 'react';
import { useTranslation } from 'react-i18next';

const useStyles = makeStyles({
  group: { margin: `${tokens.spacingVerticalM} 0 ${tokens.spacingVerticalXS}`, fontSize: tokens.fontSizeBase400 },
  list: { display: 'grid', gridTemplateColumns: 'max-content 1fr', columnGap: tokens.spacingHorizontalL, rowGap: tokens.spacingVerticalXS, margin: 0 },
  keys: { margin: 0, whiteSpace: 'nowrap' },
  kbd: {
    fontFamily: tokens.fontFamilyBase,
    padding: `0 ${tokens.spacingHorizontalXS}`,
    border: `1px solid ${tokens.colorNeutralStroke1}`,
    borderBottomWidth: '2px',
    borderRadius: tokens.borderRadiusSmall,
    backgroundColor: tokens.colorNeutralBackground3,
  },
  meaning: { margin: 0 },
});

/** Each shortcut the studio has, by where it works: the keys (joined by +, alternatives by /) and the key of what it does. */
const SHORTCUTS = {
  anywhere: [[['?'], 'sheet']],
  text: [[['Ctrl', 'B'], 'bold'], [['Ctrl', 'I'], 'italic'], [['Ctrl', 'Z'], 'undo'], [['Ctrl', 'Shift', 'Z'], 'redo'], [['Ctrl', 'Home / End'], 'panelEdges']],
  panels: [[['Alt', '← / →'], 'movePanel']],
  drawings: [[['← / →'], 'change'], [['Shift', '← / →'], 'fineChange'], [['Page Up / Page Down'], 'bigChange'], [['Home / End'], 'ends']],
  translation: [[['Ctrl', 'Enter'], 'saveNext'], [['Alt', '↑ / ↓'], 'otherUnit']],
} as const satisfies Record<string, readonly (readonly [readonly string[], string])[]>;

const SHORTCUT_GROUPS = Object.keys(SHORTCUTS) as (keyof typeof SHORTCUTS)[];
type ShortcutMeaning = (typeof SHORTCUTS)[keyof typeof SHORTCUTS][number][1];

/** A key press meant for the page, not for text being typed. */
const typingIn = (target: EventTarget | null) =>
  target instanceof HTMLElement && (target.isContentEditable || ['INPUT', 'TEXTAREA', 'SELECT'].includes(target.tagName));

/**
 * The studio's keyboard shortcuts on one sheet: opened by `?` anywhere outside a text field, or by
 * the header button. On a Mac, Ctrl is ⌘, as the editor itself takes it.
 */
export function KeyboardShortcuts({ className }: { className?: string }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const [open, setOpen] = useState(false);
  useEffect(() => {
    const onKey = (event: KeyboardEvent) => {
      if (event.key === '?' && !event.ctrlKey && !event.metaKey && !event.altKey && !typingIn(event.target)) {
        event.preventDefault();
        setOpen(true);
      }
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, []);
  const mac = /Mac|iPhone|iPad/.test(navigator.platform);
  const key = (name: string) => (name === 'Ctrl' && mac ? '⌘' : name);
  return (
    <>
      <Button appearance="subtle" icon={<KeyboardRegular />} className={className} aria-label={t('shortcuts.open')} aria-keyshortcuts="?" onClick={() => setOpen(true)} />
      <Dialog open={open} onOpenChange={(_event, data) => setOpen(data.open)}>
        <DialogSurface>
          <DialogBody>
            <DialogTitle>{t('shortcuts.title')}</DialogTitle>
            <DialogContent>
              {SHORTCUT_GROUPS.map((group) => (
                <section key={group} aria-labelledby={`shortcuts-${group}`}>
                  <h3 id={`shortcuts-${group}`} className={styles.group}>{t(`shortcuts.groups.${group}`)}</h3>
                  <dl className={styles.list}>
                    {(SHORTCUTS[group] as readonly (readonly [readonly string[], ShortcutMeaning])[]).map(([keys, meaning]) => (
                      <Fragment key={meaning}>
                        <dt className={styles.keys} dir="ltr">
                          {keys.map((name, index) => <Fragment key={name}>{index > 0 ? ' + ' : null}<kbd className={styles.kbd}>{key(name)}</kbd></Fragment>)}
                        </dt>
                        <dd className={styles.meaning}>{t(`shortcuts.does.${meaning}`)}</dd>
                      </Fragment>
                    ))}
                  </dl>
                </section>
              ))}
            </DialogContent>
            <DialogActions>
              <Button appearance="primary" onClick={() => setOpen(false)}>{t('common.close')}</Button>
            </DialogActions>
          </DialogBody>
        </DialogSurface>
      </Dialog>
    </>
  );
}

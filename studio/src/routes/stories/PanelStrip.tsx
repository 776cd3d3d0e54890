import { useState, type DragEvent, type KeyboardEvent } from 'react';
import { Button, makeStyles, mergeClasses, shorthands, tokens, Tooltip } from '@fluentui/react-components';
import { AddRegular, DeleteRegular } from '@fluentui/react-icons';
import { panelText, type PanelView } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { BackArrow, ForwardArrow } from '../../components/ReadingArrows';
import { movedTo } from './panel-order';

const useStyles = makeStyles({
  root: { display: 'flex', alignItems: 'stretch', gap: tokens.spacingHorizontalS, overflowX: 'auto', padding: `${tokens.spacingVerticalXS} 2px ${tokens.spacingVerticalS}` },
  list: { display: 'flex', gap: tokens.spacingHorizontalS, listStyle: 'none', margin: 0, padding: 0 },
  card: {
    display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXXS, width: '11rem', height: '100%', boxSizing: 'border-box',
    padding: `${tokens.spacingVerticalS} ${tokens.spacingHorizontalM}`, border: `1px solid ${tokens.colorNeutralStroke1}`, borderRadius: tokens.borderRadiusMedium,
    backgroundColor: tokens.colorNeutralBackground1, cursor: 'grab', textAlign: 'start', font: 'inherit', color: 'inherit',
    ':hover': { backgroundColor: tokens.colorNeutralBackground1Hover },
    ':focus-visible': { outline: `2px solid ${tokens.colorStrokeFocus2}`, outlineOffset: '1px' },
  },
  selected: { ...shorthands.borderColor(tokens.colorBrandStroke1), boxShadow: `inset 0 -3px 0 ${tokens.colorBrandStroke1}`, backgroundColor: tokens.colorBrandBackground2 },
  dropTarget: { ...shorthands.borderStyle('dashed'), ...shorthands.borderColor(tokens.colorBrandStroke1) },
  number: { fontSize: tokens.fontSizeBase200, color: tokens.colorNeutralForeground3, fontWeight: tokens.fontWeightSemibold },
  excerpt: { display: '-webkit-box', WebkitLineClamp: 2, WebkitBoxOrient: 'vertical', overflow: 'hidden', fontSize: tokens.fontSizeBase200, minHeight: '2.6em' },
  empty: { color: tokens.colorNeutralForeground3, fontStyle: 'italic' },
  tools: { display: 'flex', flexDirection: 'column', justifyContent: 'center', gap: tokens.spacingVerticalXXS },
  add: { alignSelf: 'center', flexShrink: 0 },
});

/**
 * The story's panels in order. Click to write one; drag to reorder, or Alt+← / Alt+→ on a focused
 * panel (and the move buttons) for the keyboard.
 */
export function PanelStrip({ panels, selectedId, onSelect, onReorder, onAdd, onDelete, adding, readOnly, locale }: {
  panels: PanelView[];
  selectedId: number | null;
  onSelect: (id: number) => void;
  onReorder: (ids: number[], focusId: number) => void;
  onAdd: () => void;
  onDelete: (panel: PanelView) => void;
  adding: boolean;
  readOnly: boolean;
  locale: string;
}) {
  const { t } = useTranslation();
  const styles = useStyles();
  const [dragged, setDragged] = useState<number | null>(null);
  const [over, setOver] = useState<number | null>(null);
  const ids = panels.map((panel) => panel.id);
  const move = (id: number, by: number) => {
    const next = movedTo(ids, id, ids.indexOf(id) + by);
    if (next.join() !== ids.join()) onReorder(next, id);
  };
  const onKeyDown = (event: KeyboardEvent, id: number) => {
    if (readOnly || !event.altKey) return;
    const by = { ArrowLeft: -1, ArrowUp: -1, ArrowRight: 1, ArrowDown: 1 }[event.key];
    if (by === undefined) return;
    event.preventDefault();
    move(id, by);
  };
  const drop = (event: DragEvent, targetId: number) => {
    event.preventDefault();
    if (dragged !== null && dragged !== targetId) onReorder(movedTo(ids, dragged, ids.indexOf(targetId)), dragged);
    setDragged(null);
    setOver(null);
  };
  const selected = panels.find((panel) => panel.id === selectedId);
  const selectedIndex = selected ? ids.indexOf(selected.id) : -1;

  return (
    <div className={styles.root}>
      <ol className={styles.list} aria-label={t('story.panels')}>
        {panels.map((panel, index) => {
          const firstLine = panelText(panel.doc, { locale }).split('\n')[0];
          return (
            <li key={panel.id}>
              <button
                type="button"
                id={`panel-card-${panel.id}`}
                className={mergeClasses(styles.card, panel.id === selectedId && styles.selected, over === panel.id && dragged !== panel.id && styles.dropTarget)}
                aria-current={panel.id === selectedId ? 'true' : undefined}
                aria-keyshortcuts={readOnly ? undefined : 'Alt+ArrowLeft Alt+ArrowRight'}
                aria-describedby={readOnly ? undefined : 'panel-strip-help'}
                draggable={!readOnly}
                onClick={() => onSelect(panel.id)}
                onKeyDown={(event) => onKeyDown(event, panel.id)}
                onDragStart={(event) => { setDragged(panel.id); event.dataTransfer.effectAllowed = 'move'; }}
                onDragOver={(event) => { if (dragged !== null) { event.preventDefault(); setOver(panel.id); } }}
                onDragLeave={() => setOver(null)}
                onDragEnd={() => { setDragged(null); setOver(null); }}
                onDrop={(event) => drop(event, panel.id)}
              >
                <span className={styles.number}>{t('story.panelNumber', { number: index + 1 })}</span>
                <span className={mergeClasses(styles.excerpt, !firstLine && styles.empty)}>{firstLine || t('story.emptyPanel')}</span>
              </button>
            </li>
          );
        })}
      </ol>
      {readOnly ? null : (
        <>
          {selected ? (
            <div className={styles.tools}>
              <Tooltip content={t('story.moveEarlier')} relationship="label" withArrow>
                <Button size="small" appearance="subtle" icon={<BackArrow />} disabled={selectedIndex <= 0} onClick={() => move(selected.id, -1)} />
              </Tooltip>
              <Tooltip content={t('story.moveLater')} relationship="label" withArrow>
                <Button size="small" appearance="subtle" icon={<ForwardArrow />} disabled={selectedIndex >= panels.length - 1} onClick={() => move(selected.id, 1)} />
              </Tooltip>
              <Tooltip content={t('story.deletePanel')} relationship="label" withArrow>
                <Button size="small" appearance="subtle" icon={<DeleteRegular />} onClick={() => onDelete(selected)} />
              </Tooltip>
            </div>
          ) : null}
          <Button className={styles.add} icon={<AddRegular />} onClick={onAdd} disabled={adding}>{t('story.addPanel')}</Button>
          <span id="panel-strip-help" hidden>{t('story.reorderHelp')}</span>
        </>
      )}
    </div>
  );
}

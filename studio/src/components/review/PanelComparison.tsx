import { useRef, useState } from 'react';
import { Badge, type BadgeProps, Button, makeStyles, Text, tokens } from '@fluentui/react-components';
import { FullScreenMaximizeRegular } from '@fluentui/react-icons';
import { panelText, type CommentRange, type CommentView, type ComparisonBasis, type PanelDiff, type PanelDocJSON, type RevisionPanelView } from '@mantlepiece/shared';
import { PanelFrame, PanelView, type ResolveMedia } from '@mantlepiece/shared/react';
import { useTranslation } from 'react-i18next';
import { StationPreviewDialog } from '../preview/StationPreviewDialog';
import { CommentThreads } from './CommentThreads';
import { useReviewStyles } from './review-styles';
import { anchorInPanelText, selectionRangeIn } from './text-selection';
import { TextDiff } from './TextDiff';
import { WidgetChanges } from './WidgetChanges';

/** Each drawing's width: two side by side fit the studio's main column on a desk screen. */
const DRAWING_WIDTH = 520;

const useStyles = makeStyles({
  top: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalM, flexWrap: 'wrap' },
  sides: { display: 'grid', gridTemplateColumns: `repeat(auto-fit, minmax(${DRAWING_WIDTH / 2}px, ${DRAWING_WIDTH}px))`, gap: tokens.spacingHorizontalL },
  side: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXS, minWidth: 0 },
  sideTop: { display: 'flex', alignItems: 'center', justifyContent: 'space-between', gap: tokens.spacingHorizontalS },
  selection: { display: 'flex', flexWrap: 'wrap', alignItems: 'center', gap: tokens.spacingHorizontalM },
  stage: { padding: tokens.spacingHorizontalXS, backgroundColor: '#23282d', borderRadius: tokens.borderRadiusMedium, width: 'fit-content', maxWidth: '100%' },
  selectable: { cursor: 'text' },
  absent: {
    display: 'flex',
    alignItems: 'center',
    justifyContent: 'center',
    aspectRatio: '16 / 9',
    maxWidth: `${DRAWING_WIDTH}px`,
    border: `1px dashed ${tokens.colorNeutralStroke1}`,
    borderRadius: tokens.borderRadiusMedium,
    color: tokens.colorNeutralForeground3,
    padding: tokens.spacingHorizontalM,
    textAlign: 'center',
  },
  details: { display: 'grid', gridTemplateColumns: 'minmax(0, 3fr) minmax(0, 2fr)', gap: tokens.spacingHorizontalXL, '@media (max-width: 1100px)': { gridTemplateColumns: 'minmax(0, 1fr)' } },
  block: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXS },
});

const STATUS_COLOURS: Record<PanelDiff['status'], BadgeProps['color']> = { added: 'success', removed: 'danger', changed: 'warning', unchanged: 'subtle' };

function Drawing({ doc, locale, resolveMedia }: { doc: PanelDocJSON; locale: string; resolveMedia: ResolveMedia }) {
  const styles = useStyles();
  return (
    <div className={styles.stage}>
      <PanelFrame layout="landscape" maxWidth={DRAWING_WIDTH}>
        <PanelView doc={doc} locale={locale} layout="landscape" resolveMedia={resolveMedia} links="text" reducedMotion />
      </PanelFrame>
    </div>
  );
}

export interface PanelComparisonProps {
  diff: PanelDiff;
  panel: RevisionPanelView | undefined;
  basePanel: RevisionPanelView | undefined;
  /** What the revision is compared with: the last approved one, the one changes were asked on, or nothing yet. */
  basis: ComparisonBasis;
  locale: string;
  resolveMedia: ResolveMedia;
  revisionId: number;
  comments: CommentView[];
  canComment: boolean;
}

/**
 * One panel of the revision beside the same panel in the last approved one (or, while none is,
 * the one changes were asked on), both drawn by the kiosk's renderer; then the word-level text
 * changes, the widget settings that moved, and the panel's comments. On a first review there is
 * nothing to compare with, so the panel is shown alone, its text unmarked. Selecting words in
 * this revision's drawing anchors a new comment to them.
 */
export function PanelComparison({ diff, panel, basePanel, basis, locale, resolveMedia, revisionId, comments, canComment }: PanelComparisonProps) {
  const { t } = useTranslation();
  const styles = useStyles();
  const shared = useReviewStyles();
  const drawing = useRef<HTMLDivElement>(null);
  const [range, setRange] = useState<CommentRange | null>(null);
  const [fullSize, setFullSize] = useState(false);
  const number = diff.numberAfter ?? diff.numberBefore ?? 0;
  const title = t('story.panelNumber', { number });
  const headingId = `panel-${diff.panelId}-heading`;

  const firstReview = basis === 'first_review';
  const baseDoc = basePanel?.docs[locale];
  const doc = panel?.docs[locale];
  const captureSelection = (within: HTMLElement | null) => {
    if (!within || !doc) return;
    const selected = selectionRangeIn(within, window.getSelection());
    const anchored = selected && anchorInPanelText(panelText(doc, { locale }), selected);
    if (anchored) setRange(anchored);
  };

  return (
    <section id={`panel-${diff.panelId}`} className={shared.card} aria-labelledby={headingId} data-panel-id={diff.panelId} data-panel-status={diff.status}>
      <div className={styles.top}>
        <Text as="h2" id={headingId} size={500} weight="semibold" className={shared.heading}>{title}</Text>
        {firstReview ? null : <Badge appearance="tint" color={STATUS_COLOURS[diff.status]}>{t(`diff.status.${diff.status}`)}</Badge>}
        {diff.numberBefore !== undefined && diff.numberAfter !== undefined && diff.numberBefore !== diff.numberAfter ? (
          <Text className={shared.muted}>{t('diff.moved', { number: diff.numberBefore })}</Text>
        ) : null}
      </div>

      <div className={styles.sides}>
        {firstReview ? null : (
          <div className={styles.side}>
            <Text weight="semibold">{basis === 'approved' ? t('diff.lastApproved') : t('diff.changesAskedOn')}</Text>
            {baseDoc ? <Drawing doc={baseDoc} locale={locale} resolveMedia={resolveMedia} /> : <div className={styles.absent}>{basis === 'approved' ? t('diff.notInBase') : t('diff.notInChangesBase')}</div>}
          </div>
        )}
        <div className={styles.side}>
          <div className={styles.sideTop}>
            <Text weight="semibold">{t('diff.thisRevision')}</Text>
            {doc ? (
              <Button size="small" icon={<FullScreenMaximizeRegular />} onClick={() => setFullSize(true)} aria-describedby={headingId}>
                {t('stationPreview.open')}
              </Button>
            ) : null}
          </div>
          {doc ? (
            // The drawing stays a drawing for everyone; selecting its words is a shortcut that the comment box repeats in words.
            <div ref={drawing} className={styles.selectable} onMouseUp={() => captureSelection(drawing.current)} onKeyUp={() => captureSelection(drawing.current)} data-selectable-panel>
              <Drawing doc={doc} locale={locale} resolveMedia={resolveMedia} />
            </div>
          ) : (
            <div className={styles.absent}>{t('diff.removedHere')}</div>
          )}
          {doc && canComment ? <Text size={200} className={shared.muted}>{t('comments.selectHint')}</Text> : null}
          {doc && fullSize ? (
            <StationPreviewDialog
              title={t('stationPreview.title', { number })}
              doc={doc}
              locale={locale}
              resolveMedia={resolveMedia}
              onClose={() => setFullSize(false)}
              onSelectionEnd={canComment ? captureSelection : undefined}
              footer={
                canComment ? (
                  <div className={styles.selection}>
                    <Text className={shared.muted}>{range ? t('stationPreview.selected', { quote: range.quote }) : t('comments.selectHint')}</Text>
                    {range ? <Button onClick={() => setFullSize(false)}>{t('stationPreview.commentOnSelection')}</Button> : null}
                  </div>
                ) : null
              }
            />
          ) : null}
        </div>
      </div>

      <div className={styles.details}>
        <div className={styles.block}>
          <Text as="h3" weight="semibold" className={shared.heading}>{firstReview ? t('diff.text') : diff.status === 'unchanged' ? t('diff.textUnchanged') : t('diff.textChanges')}</Text>
          {diff.text.length === 0 ? (
            <Text className={shared.muted}>{t('diff.noText')}</Text>
          ) : (
            // Nothing came before a first review, so its words are read as they are, not as insertions.
            <TextDiff pieces={firstReview ? diff.text.map((piece) => ({ ...piece, kind: 'same' as const })) : diff.text} locale={locale} />
          )}
          {firstReview ? null : (
            <>
              {diff.media.added.length + diff.media.removed.length > 0 ? (
                <Text className={shared.muted}>{t('diff.media', { added: diff.media.added.length, removed: diff.media.removed.length })}</Text>
              ) : null}
              <Text as="h3" weight="semibold" className={shared.heading}>{t('diff.widgetChanges')}</Text>
              <WidgetChanges changes={diff.widgets} />
            </>
          )}
        </div>
        <div className={styles.block}>
          <Text as="h3" weight="semibold" className={shared.heading}>{t('comments.title')}</Text>
          <CommentThreads
            revisionId={revisionId}
            comments={comments}
            panelId={diff.panelId}
            canComment={canComment && doc !== undefined}
            range={range}
            onClearRange={() => setRange(null)}
          />
        </div>
      </div>
    </section>
  );
}

import { Button, Dialog, DialogActions, DialogBody, DialogContent, DialogSurface, DialogTitle, makeStyles, Text, tokens } from '@fluentui/react-components';
import type { ReleaseView } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { usePublishRelease, useReleaseComparison } from '../../api/releases';
import { useDateFormat } from '../../components/formatting';
import { FormAlert } from '../../components/forms/FormAlert';
import { describeError } from '../../components/forms/describe-error';
import { TextLink } from '../../components/links';
import { publicationKind } from './publication-kind';

const useStyles = makeStyles({
  content: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  list: { margin: 0, paddingInlineStart: tokens.spacingHorizontalXL },
  muted: { color: tokens.colorNeutralForeground3 },
});

/**
 * Says what goes Live and what it replaces before anything changes on a gallery's screens.
 * A Superseded release going Live again rolls the gallery back or moves it forward; the wording says which.
 */
export function PublishDialog({ release, live, galleryName, onClose }: {
  release: ReleaseView;
  live: ReleaseView | undefined;
  galleryName: string;
  onClose: () => void;
}) {
  const { t } = useTranslation();
  const styles = useStyles();
  const formatDate = useDateFormat();
  const publish = usePublishRelease();
  const comparison = useReleaseComparison(live?.id, release.id);
  const kind = publicationKind(release, live) ?? 'publish';
  const name = t('releases.name', { number: release.number });
  const action = kind === 'publish' ? t('releases.publish.confirm', { name }) : t(`releases.publish.${kind}Confirm`, { name });
  return (
    <Dialog open modalType="alert" onOpenChange={(_event, data) => { if (!data.open) onClose(); }}>
      <DialogSurface>
        <DialogBody>
          <DialogTitle>{kind === 'publish' ? t('releases.publish.title', { name, gallery: galleryName }) : t(`releases.publish.${kind}Title`, { name, gallery: galleryName })}</DialogTitle>
          <DialogContent className={styles.content}>
            <Text as="p">{t('releases.publish.goesLive', { name, gallery: galleryName })}</Text>
            <div>
              <Text weight="semibold">{t('releases.publish.carries', { count: release.stories.length })}</Text>
              <ul className={styles.list}>
                {release.stories.map((story) => <li key={story.storyId}>{t('releases.storyRevision', { title: story.title, number: story.revisionNumber })}</li>)}
              </ul>
            </div>
            {live ? (
              <Text as="p">
                {t('releases.publish.replaces', { live: t('releases.name', { number: live.number }), since: live.publishedAt ? formatDate(live.publishedAt) : '—' })}{' '}
                {comparison.data ? (
                  <TextLink to={`/releases/compare?a=${live.id}&b=${release.id}`}>
                    {t('releases.publish.changes', { added: comparison.data.added.length, removed: comparison.data.removed.length, changed: comparison.data.changed.length })}
                  </TextLink>
                ) : null}
              </Text>
            ) : <Text as="p" className={styles.muted}>{t('releases.publish.firstLive')}</Text>}
            {publish.error ? <FormAlert intent="error">{describeError(t, publish.error)}</FormAlert> : null}
          </DialogContent>
          <DialogActions>
            <Button appearance="secondary" onClick={onClose}>{t('common.cancel')}</Button>
            <Button appearance="primary" disabled={publish.isPending} onClick={() => publish.mutate(release.id, { onSuccess: onClose })}>{action}</Button>
          </DialogActions>
        </DialogBody>
      </DialogSurface>
    </Dialog>
  );
}

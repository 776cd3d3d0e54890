import { Button, Field, makeStyles, ProgressBar, Text, tokens } from '@fluentui/react-components';
import type { ReleaseView } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useRelease } from '../../api/releases';
import { FormAlert } from '../forms/FormAlert';
import { describeError } from '../forms/describe-error';

const useStyles = makeStyles({
  root: {
    display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS, padding: tokens.spacingHorizontalL, marginBottom: tokens.spacingVerticalL,
    backgroundColor: tokens.colorNeutralBackground1, border: `1px solid ${tokens.colorNeutralStroke2}`, borderRadius: tokens.borderRadiusLarge, maxWidth: '48rem',
  },
  phase: { color: tokens.colorNeutralForeground2 },
  ready: { display: 'flex', alignItems: 'center', justifyContent: 'space-between', gap: tokens.spacingHorizontalM, flexWrap: 'wrap' },
});

/** Follows one build from the request to Ready or Failed; on Ready it offers what comes next. */
export function BuildProgress({ releaseId, onPublish }: { releaseId: number; onPublish: (release: ReleaseView) => void }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const release = useRelease(releaseId);
  if (release.isError) return <FormAlert intent="error">{describeError(t, release.error)}</FormAlert>;
  const view = release.data;
  // Once published the release speaks for itself in the table.
  if (view?.state === 'live' || view?.state === 'superseded') return null;
  const building = !view || view.state === 'building';
  const label = !view ? t('common.loading') : t(building ? 'releases.build.progressLabel' : 'releases.build.doneLabel', { number: view.number });
  return (
    <section className={styles.root} aria-label={label} data-release-id={releaseId}>
      <Field
        label={label}
        validationState={view?.state === 'failed' ? 'error' : view && !building ? 'success' : 'none'}
        validationMessage={view?.state === 'failed' ? t('releases.build.failed', { reason: view.failure ?? view.phase }) : undefined}
      >
        <ProgressBar value={view?.progress ?? 0} max={1} thickness="large" />
      </Field>
      {building ? <Text className={styles.phase} aria-live="polite">{view?.phase ?? t('releases.build.waiting')}</Text> : null}
      {view?.state === 'ready' ? (
        <div className={styles.ready}>
          <Text>{t('releases.build.ready', { number: view.number, stories: view.stories.length })}</Text>
          <Button appearance="primary" onClick={() => onPublish(view)}>{t('releases.actions.publish')}</Button>
        </div>
      ) : null}
    </section>
  );
}

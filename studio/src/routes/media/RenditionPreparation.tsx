import { Button, MessageBar, MessageBarActions, MessageBarBody, MessageBarTitle, Spinner } from '@fluentui/react-components';
import type { MediaView } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useRetryRenditions } from '../../api/media';
import { describeError } from '../../components/forms/describe-error';

/** While an image's screen renditions are made: how far it got; once they failed: why, and a Retry for those who keep the library. */
export function RenditionPreparation({ asset, canRetry }: { asset: MediaView; canRetry: boolean }) {
  const { t, i18n } = useTranslation();
  const retry = useRetryRenditions(asset.id);
  const { state, progress, failure } = asset.renditionStatus;
  if (state === 'pending') {
    const percent = new Intl.NumberFormat(i18n.resolvedLanguage, { style: 'percent' }).format(progress);
    return (
      <MessageBar intent="info" icon={<Spinner size="tiny" />}>
        <MessageBarBody>
          <MessageBarTitle>{t('media.preparation.preparing')}</MessageBarTitle>
          {t('media.preparation.preparingBody', { percent })}
        </MessageBarBody>
      </MessageBar>
    );
  }
  if (state !== 'failed') return null;
  return (
    <MessageBar intent="error" layout="multiline">
      <MessageBarBody>
        <MessageBarTitle>{t('media.preparation.failedTitle')}</MessageBarTitle>
        {retry.error ? describeError(t, retry.error) : failure}
      </MessageBarBody>
      {canRetry ? (
        <MessageBarActions>
          <Button onClick={() => retry.mutate()} disabled={retry.isPending}>{retry.isPending ? t('media.preparation.retrying') : t('media.preparation.retry')}</Button>
        </MessageBarActions>
      ) : null}
    </MessageBar>
  );
}

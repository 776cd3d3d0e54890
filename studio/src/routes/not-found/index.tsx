import { useTranslation } from 'react-i18next';
import { EmptyState } from '../../components/EmptyState';
import { PageHeader } from '../../components/PageHeader';
import { LinkButton } from '../../components/links';

export function NotFoundPage() {
  const { t } = useTranslation();
  return (
    <>
      <PageHeader title={t('notFound.title')} />
      <EmptyState title={t('notFound.title')} actions={<LinkButton to="/">{t('area.backHome')}</LinkButton>}>
        {t('notFound.body')}
      </EmptyState>
    </>
  );
}

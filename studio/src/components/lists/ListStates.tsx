import type { ReactNode } from 'react';
import { Button, Spinner } from '@fluentui/react-components';
import type { UseQueryResult } from '@tanstack/react-query';
import type { Page } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { EmptyState } from '../EmptyState';
import { describeError } from '../forms/describe-error';

/** Loading, failed and empty states of a paged list, worded by the page; the list itself when there are rows. */
export function ListStates<T>({ query, loadError, empty, children }: {
  query: UseQueryResult<Page<T>>;
  loadError: string;
  empty: ReactNode;
  children: (page: Page<T>) => ReactNode;
}) {
  const { t } = useTranslation();
  if (query.isPending) return <Spinner label={t('common.loading')} />;
  if (query.isError) {
    return (
      <EmptyState title={loadError} actions={<Button onClick={() => void query.refetch()}>{t('common.retry')}</Button>}>
        {describeError(t, query.error)}
      </EmptyState>
    );
  }
  return query.data.items.length === 0 ? empty : children(query.data);
}

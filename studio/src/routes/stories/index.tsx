import { useState } from 'react';
import { Button, Field, makeStyles, SearchBox, Select, tokens } from '@fluentui/react-components';
import { AddRegular, BookOpenRegular } from '@fluentui/react-icons';
import { AUDIENCES, STORY_SORT, STORY_STATES } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useNavigate } from 'react-router-dom';
import { useStories } from '../../api/stories';
import { EmptyState } from '../../components/EmptyState';
import { useListSearch } from '../../components/lists/use-list-search';
import { PageHeader } from '../../components/PageHeader';
import { CreateStoryDialog } from './CreateStoryDialog';
import { readStoryListParams } from './list-params';
import { StoryList } from './StoryList';
import { useExhibitChoices } from './StoryFieldsForm';

const useStyles = makeStyles({
  toolbar: { display: 'flex', gap: tokens.spacingHorizontalL, alignItems: 'flex-end', flexWrap: 'wrap', marginBottom: tokens.spacingVerticalL },
  search: { minWidth: '18rem' },
});

export function StoriesPage() {
  const { t } = useTranslation();
  const styles = useStyles();
  const navigate = useNavigate();
  const { search, query, setQuery, change, clear } = useListSearch();
  const params = readStoryListParams(search);
  const stories = useStories(params);
  const exhibits = useExhibitChoices();
  const [creating, setCreating] = useState(false);

  const filtered = Boolean(params.q || params.state || params.exhibitId || params.audience);
  const createButton = stories.data?.can.create ? (
    <Button appearance="primary" icon={<AddRegular />} onClick={() => setCreating(true)}>{t('stories.new')}</Button>
  ) : null;

  return (
    <>
      <PageHeader title={t('stories.title')} intro={t('stories.intro')} actions={createButton} />
      <div className={styles.toolbar} role="search">
        <Field label={t('stories.search')} className={styles.search}>
          <SearchBox value={query} onChange={(_event, data) => setQuery(data.value)} />
        </Field>
        <Field label={t('stories.columns.state')}>
          <Select value={params.state ?? ''} onChange={(_event, data) => change({ state: data.value || undefined })}>
            <option value="">{t('stories.anyState')}</option>
            {STORY_STATES.map((state) => <option key={state} value={state}>{t(`storyStates.${state}`)}</option>)}
          </Select>
        </Field>
        <Field label={t('stories.columns.exhibit')}>
          <Select value={params.exhibitId ? String(params.exhibitId) : ''} onChange={(_event, data) => change({ exhibitId: data.value || undefined })}>
            <option value="">{t('stories.anyExhibit')}</option>
            {exhibits.data?.items.map((exhibit) => <option key={exhibit.id} value={String(exhibit.id)}>{exhibit.name}</option>)}
          </Select>
        </Field>
        <Field label={t('stories.columns.audience')}>
          <Select value={params.audience ?? ''} onChange={(_event, data) => change({ audience: data.value || undefined })}>
            <option value="">{t('stories.anyAudience')}</option>
            {AUDIENCES.map((audience) => <option key={audience} value={audience}>{t(`audiences.${audience}`)}</option>)}
          </Select>
        </Field>
      </div>

      <StoryList
        stories={stories}
        sort={params.sort ?? STORY_SORT.fallback}
        onChange={change}
        empty={
          filtered ? (
            <EmptyState
              icon={<BookOpenRegular />}
              title={t('stories.noMatchTitle')}
              actions={<Button onClick={clear}>{t('lists.clearFilters')}</Button>}
            >
              {t('stories.noMatchBody')}
            </EmptyState>
          ) : (
            <EmptyState icon={<BookOpenRegular />} title={t('stories.emptyTitle')} actions={createButton}>
              {t('stories.emptyBody')}
            </EmptyState>
          )
        }
      />

      {creating ? <CreateStoryDialog onClose={() => setCreating(false)} onCreated={(story) => void navigate(`/stories/${story.id}`)} /> : null}
    </>
  );
}

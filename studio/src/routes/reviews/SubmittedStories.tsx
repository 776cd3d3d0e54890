import { Field, makeStyles, Select, tokens } from '@fluentui/react-components';
import { ClipboardTaskListLtrRegular } from '@fluentui/react-icons';
import { PAGE_SIZE, STORY_SORT, type StoryState } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useSearchParams } from 'react-router-dom';
import { useStories, type StoryListParams } from '../../api/stories';
import { EmptyState } from '../../components/EmptyState';
import { oneOf, pageFrom, sortFrom, withSearchChanges } from '../../components/lists/list-search';
import { StoryList } from '../stories/StoryList';

const useStyles = makeStyles({
  toolbar: { display: 'flex', gap: tokens.spacingHorizontalL, alignItems: 'flex-end', marginBottom: tokens.spacingVerticalL },
});

/** The states a curator follows a submission through: waiting for a verdict, or sent back. */
const FOLLOWED_STATES = ['in_review', 'changes_requested'] as const satisfies readonly StoryState[];

/**
 * For people who submit rather than review: the stories waiting for a verdict or sent back, from
 * the stories list (the review queue itself is the educators'). Each leads to its story, whose
 * revisions lead to the review page.
 */
export function SubmittedStories() {
  const { t } = useTranslation();
  const styles = useStyles();
  const [search, setSearch] = useSearchParams();
  const state = oneOf(search.get('state'), FOLLOWED_STATES) ?? 'in_review';
  const params: StoryListParams = { page: pageFrom(search), pageSize: PAGE_SIZE.fallback, state, sort: sortFrom(search, STORY_SORT) };
  const stories = useStories(params);
  const change = (changes: Record<string, string | undefined>) => setSearch((current) => withSearchChanges(current, changes), { replace: true });
  return (
    <>
      <div className={styles.toolbar}>
        <Field label={t('stories.columns.state')}>
          <Select value={state} onChange={(_event, data) => change({ state: data.value })}>
            {FOLLOWED_STATES.map((option) => <option key={option} value={option}>{t(`storyStates.${option}`)}</option>)}
          </Select>
        </Field>
      </div>
      <StoryList
        stories={stories}
        sort={params.sort ?? STORY_SORT.fallback}
        onChange={change}
        empty={<EmptyState icon={<ClipboardTaskListLtrRegular />} title={t('reviews.emptyTitleCurator')}>{t('reviews.emptyBodyCurator')}</EmptyState>}
      />
    </>
  );
}

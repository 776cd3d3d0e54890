import { useState } from 'react';
import { Button, makeStyles, Spinner, tokens } from '@fluentui/react-components';
import { DocumentAddRegular } from '@fluentui/react-icons';
import { emptyPanelDoc, type PanelView } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useParams, useSearchParams } from 'react-router-dom';
import { ApiError } from '../../api/client';
import { useCreatePanel, useDeletePanel, useReorderPanels, useRestorePanel, useStory } from '../../api/stories';
import { ConfirmDialog } from '../../components/ConfirmDialog';
import { useOfferUndo } from '../../components/UndoToaster';
import { EmptyState } from '../../components/EmptyState';
import { FormAlert } from '../../components/forms/FormAlert';
import { describeError } from '../../components/forms/describe-error';
import { LinkButton } from '../../components/links';
import { StoryReview } from '../../components/review/StoryReview';
import { PanelStrip } from './PanelStrip';
import { PanelWorkspace } from './PanelWorkspace';
import { StoryHeader } from './StoryHeader';

const useStyles = makeStyles({
  strip: { marginBottom: tokens.spacingVerticalM },
});

/** A new panel's word budget: tens of words per screen, as museum practice writes (common practice). */
const DEFAULT_WORD_BUDGET = 60;

export function StoryPage() {
  const { t } = useTranslation();
  const styles = useStyles();
  const { id } = useParams();
  const storyId = Number(id);
  const story = useStory(storyId);
  const [search, setSearch] = useSearchParams();
  const createPanel = useCreatePanel(storyId);
  const reorder = useReorderPanels(storyId);
  const deletePanel = useDeletePanel(storyId);
  const restorePanel = useRestorePanel(storyId);
  const offerUndo = useOfferUndo();
  const [deleting, setDeleting] = useState<PanelView | null>(null);

  if (story.isPending) return <Spinner label={t('common.loading')} />;
  if (story.isError) {
    const missing = story.error instanceof ApiError && story.error.status === 404;
    return (
      <EmptyState
        title={missing ? t('story.notFound') : t('story.loadError')}
        actions={<LinkButton to="/stories">{t('story.backToStories')}</LinkButton>}
      >
        {missing ? t('story.notFoundBody') : describeError(t, story.error)}
      </EmptyState>
    );
  }

  const { panels } = story.data;
  const readOnly = !story.data.can.edit;
  const selectedId = Number(search.get('panel')) || panels[0]?.id || null;
  const selected = panels.find((panel) => panel.id === selectedId) ?? panels[0];
  const select = (panelId: number) => setSearch((current) => { const next = new URLSearchParams(current); next.set('panel', String(panelId)); return next; }, { replace: true });

  const add = () =>
    createPanel.mutate(
      { doc: emptyPanelDoc(), position: panels.length, wordBudget: DEFAULT_WORD_BUDGET },
      { onSuccess: (panel) => select(panel.id) },
    );
  const confirmDelete = () => {
    if (!deleting) return;
    const index = panels.findIndex((panel) => panel.id === deleting.id);
    const neighbour = panels[index + 1] ?? panels[index - 1];
    const panelId = deleting.id;
    deletePanel.mutate(panelId, {
      onSuccess: () => {
        setDeleting(null);
        if (neighbour) select(neighbour.id);
        offerUndo({ key: 'undo.panelDeleted', values: { number: index + 1 } }, () => restorePanel.mutateAsync(panelId));
      },
    });
  };

  return (
    <>
      <StoryHeader story={story.data} readOnly={readOnly} />
      <StoryReview story={story.data} />
      <div className={styles.strip}>
        <PanelStrip
          panels={panels}
          selectedId={selected?.id ?? null}
          onSelect={select}
          onReorder={(ids) => reorder.mutate(ids)}
          onAdd={add}
          onDelete={setDeleting}
          adding={createPanel.isPending}
          readOnly={readOnly}
          locale={story.data.sourceLocale}
        />
        {reorder.isError ? <FormAlert intent="error">{describeError(t, reorder.error)}</FormAlert> : null}
        {createPanel.isError ? <FormAlert intent="error">{describeError(t, createPanel.error)}</FormAlert> : null}
      </div>

      {selected ? (
        <PanelWorkspace key={selected.id} story={story.data} panel={selected} readOnly={readOnly} />
      ) : (
        <EmptyState
          icon={<DocumentAddRegular />}
          title={t('story.noPanelsTitle')}
          actions={readOnly ? null : <Button appearance="primary" onClick={add} disabled={createPanel.isPending}>{t('story.addFirstPanel')}</Button>}
        >
          {t('story.noPanelsBody')}
        </EmptyState>
      )}

      {deleting ? (
        <ConfirmDialog
          title={t('story.deleteTitle', { number: panels.findIndex((panel) => panel.id === deleting.id) + 1 })}
          confirmLabel={t('story.deleteConfirm')}
          pending={deletePanel.isPending}
          problem={deletePanel.isError ? describeError(t, deletePanel.error) : null}
          onConfirm={confirmDelete}
          onCancel={() => setDeleting(null)}
        >
          {t('story.deleteBody')}
        </ConfirmDialog>
      ) : null}
    </>
  );
}

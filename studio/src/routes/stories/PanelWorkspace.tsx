import { useDeferredValue, useEffect, useLayoutEffect, useRef, useState } from 'react';
import { Field, makeStyles, Select, SpinButton, Spinner, Tab, TabList, Text, tokens } from '@fluentui/react-components';
import { EditorContent, useEditorState } from '@tiptap/react';
import { NodeSelection } from '@tiptap/pm/state';
import { livePhrasesIn, LIVE_PHRASE_NODE, mediaIdsIn, openThreadCount, widgetsIn, WIDGET_NODE, type MediaView, type PanelDocJSON, type PanelView, type StoryDetailView, type WidgetType } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useDraftComments } from '../../api/draft-comments';
import { useMediaAssets } from '../../api/media';
import { useRememberSavedPanel, useUpdatePanelBudget } from '../../api/stories';
import { FormAlert } from '../../components/forms/FormAlert';
import { ConflictDialog } from '../../components/editor/ConflictDialog';
import { DraftComments } from '../../components/editor/DraftComments';
import { EditorToolbar } from '../../components/editor/EditorToolbar';
import { insertionChain } from '../../components/editor/insert-point';
import { LinkDialog } from '../../components/editor/LinkDialog';
import { LivePhraseSettings } from '../../components/editor/LivePhraseSettings';
import { useResolveMedia } from '../../components/editor/media-resolver';
import { MediaPickerDialog } from '../../components/editor/MediaPickerDialog';
import { PanelPreview } from '../../components/editor/PanelPreview';
import { SaveStatus } from '../../components/editor/SaveStatus';
import { TextMeasures } from '../../components/editor/TextMeasures';
import { usePanelAutosave } from '../../components/editor/use-panel-autosave';
import { usePanelEditor } from '../../components/editor/use-panel-editor';
import { WidgetSettings } from '../../components/editor/WidgetSettings';
import { useEditorStyles } from './editor-styles';

const SIDE_WIDTH = 400;

type SideTab = 'widget' | 'comments' | 'preview';

const useStyles = makeStyles({
  root: { display: 'grid', gridTemplateColumns: `minmax(0, 1fr) ${SIDE_WIDTH}px`, gap: tokens.spacingHorizontalL, alignItems: 'start', '@media (max-width: 1280px)': { gridTemplateColumns: 'minmax(0, 1fr)' } },
  main: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS, minWidth: 0 },
  frame: { border: `1px solid ${tokens.colorNeutralStroke1}`, borderRadius: tokens.borderRadiusLarge, backgroundColor: tokens.colorNeutralBackground1, overflow: 'hidden' },
  toolbar: { borderBottom: `1px solid ${tokens.colorNeutralStroke2}`, backgroundColor: tokens.colorNeutralBackground2, padding: `${tokens.spacingVerticalXXS} ${tokens.spacingHorizontalS}`, position: 'sticky', top: 0, zIndex: 1 },
  status: { display: 'flex', alignItems: 'center', justifyContent: 'space-between', gap: tokens.spacingHorizontalL, flexWrap: 'wrap' },
  budget: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalS },
  budgetInput: { width: '6rem' },
  side: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM, position: 'sticky', top: tokens.spacingVerticalL },
  sideBody: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM, padding: tokens.spacingHorizontalM, border: `1px solid ${tokens.colorNeutralStroke2}`, borderRadius: tokens.borderRadiusLarge, backgroundColor: tokens.colorNeutralBackground1 },
  muted: { color: tokens.colorNeutralForeground3 },
});

/** Loads the images a panel shows into the cache first, so its editor draws them from the first frame. */
function usePanelMedia(doc: PanelDocJSON) {
  const [ids] = useState(() => mediaIdsIn(doc).map(Number).filter(Number.isInteger));
  return useMediaAssets(ids).every((result) => !result.isPending);
}

/** The one panel being written: toolbar, editor, save state, measures, widget settings and preview. */
export function PanelWorkspace({ story, panel, readOnly }: { story: StoryDetailView; panel: PanelView; readOnly: boolean }) {
  const rememberSaved = useRememberSavedPanel(story.id);
  const autosave = usePanelAutosave(panel, (doc, version) => rememberSaved(panel.id, doc, version));
  const mediaReady = usePanelMedia(autosave.initialDoc);
  const { t } = useTranslation();
  if (!mediaReady) return <Spinner label={t('common.loading')} />;
  return <PanelEditorArea story={story} panel={panel} autosave={autosave} readOnly={readOnly} />;
}

function PanelEditorArea({ story, panel, autosave, readOnly }: { story: StoryDetailView; panel: PanelView; autosave: ReturnType<typeof usePanelAutosave>; readOnly: boolean }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const editorStyles = useEditorStyles();
  const locale = story.sourceLocale;
  const resolveMedia = useResolveMedia(locale);
  const [doc, setDoc] = useState<PanelDocJSON>(autosave.initialDoc);
  const shownDoc = useDeferredValue(doc);
  const [dialog, setDialog] = useState<'image' | 'link' | 'conflict' | null>(null);
  const [sideTab, setSideTab] = useState<SideTab>('widget');
  const draftComments = useDraftComments(story.id);
  const openHere = draftComments.revision ? openThreadCount(draftComments.revision.comments.filter((comment) => comment.panelId === panel.id)) : 0;
  const [chosenWidget, setChosenWidget] = useState<string | null>(null);
  const budget = useUpdatePanelBudget(story.id);
  const change = useRef(autosave.change);
  useLayoutEffect(() => {
    change.current = autosave.change;
  });

  const editor = usePanelEditor({
    initialDoc: autosave.initialDoc,
    locale,
    resolveMedia,
    onChange: (next) => {
      setDoc(next);
      change.current(next);
    },
  });

  useEffect(() => {
    editor.setEditable(!readOnly, false);
  }, [editor, readOnly]);

  // Selecting a widget block or a live phrase in the text brings up its settings beside the editor.
  const selected = useEditorState({
    editor,
    selector: ({ editor: current }) => {
      const { selection } = current.state;
      const name = selection instanceof NodeSelection ? selection.node.type.name : null;
      return {
        widget: name === WIDGET_NODE ? String((selection as NodeSelection).node.attrs.widgetId) : null,
        phrase: name === LIVE_PHRASE_NODE ? String((selection as NodeSelection).node.attrs.phraseId) : null,
      };
    },
  });
  // State adjusted while rendering when the selection changes, not in an effect.
  const [seenSelection, setSeenSelection] = useState(selected);
  if (seenSelection.widget !== selected.widget || seenSelection.phrase !== selected.phrase) {
    setSeenSelection(selected);
    if (selected.widget) setChosenWidget(selected.widget);
    if (selected.widget || selected.phrase) setSideTab('widget');
  }

  const shownRevision = draftComments.revision;
  useEffect(() => {
    if (shownRevision) editor.commands.showComments(shownRevision.comments, panel.id, locale);
  }, [editor, shownRevision, panel.id, locale]);

  const [seenSaveStatus, setSeenSaveStatus] = useState(autosave.state.status);
  if (seenSaveStatus !== autosave.state.status) {
    setSeenSaveStatus(autosave.state.status);
    if (autosave.state.status === 'conflict') setDialog('conflict');
  }

  const widgets = widgetsIn(doc);
  const widget = widgets.find((candidate) => candidate.widgetId === chosenWidget) ?? widgets[0];
  const phrase = selected.phrase ? livePhrasesIn(doc).find((candidate) => candidate.phraseId === selected.phrase) : undefined;

  const pick = (asset: MediaView) => {
    setDialog(null);
    insertionChain(editor).insertPanelImage({ mediaId: String(asset.id) }).run();
  };
  const takeTheirs = () => {
    const theirs = autosave.takeTheirs();
    if (theirs) {
      editor.commands.setContent(theirs, { emitUpdate: false });
      setDoc(theirs);
    }
    setDialog(null);
  };

  return (
    <div className={styles.root}>
      <div className={styles.main}>
        {autosave.restoredDraft ? <FormAlert intent="info">{t('editor.restoredDraft')}</FormAlert> : null}
        {autosave.state.status === 'invalid' ? (
          <FormAlert intent="warning">{t('editor.invalidDoc', { problems: autosave.state.issues.map((issue) => issue.message).join(' ') })}</FormAlert>
        ) : null}
        <div className={styles.frame}>
          {readOnly ? null : (
            <div className={styles.toolbar}>
              <EditorToolbar editor={editor} locale={locale} onPickImage={() => setDialog('image')} onEditLink={() => setDialog('link')} />
            </div>
          )}
          <EditorContent editor={editor} className={editorStyles.content} />
        </div>
        <div className={styles.status}>
          <SaveStatus state={autosave.state} onRetry={autosave.saveNow} onResolve={() => setDialog('conflict')} />
          <TextMeasures doc={shownDoc} locale={locale} wordBudget={panel.wordBudget} audience={story.audience} />
          <div className={styles.budget}>
            <Text id={`budget-${panel.id}`}>{t('editor.budget')}</Text>
            <SpinButton
              className={styles.budgetInput}
              aria-labelledby={`budget-${panel.id}`}
              value={panel.wordBudget}
              min={5}
              max={500}
              step={5}
              disabled={readOnly}
              onChange={(_event, data) => {
                const next = data.value ?? Number(data.displayValue);
                if (Number.isInteger(next) && next > 0 && next !== panel.wordBudget) budget.mutate({ panelId: panel.id, wordBudget: next });
              }}
            />
          </div>
        </div>
        {budget.isError ? <FormAlert intent="error">{budget.error.message}</FormAlert> : null}
      </div>

      <aside className={styles.side} aria-label={t('editor.side')}>
        <TabList selectedValue={sideTab} onTabSelect={(_event, data) => setSideTab(data.value as SideTab)}>
          <Tab value="widget">{t('editor.widget.tab')}</Tab>
          <Tab value="comments" data-open-comments={openHere}>{t('draftComments.tab', { open: openHere })}</Tab>
          <Tab value="preview">{t('editor.preview.title')}</Tab>
        </TabList>
        <div className={styles.sideBody}>
          {sideTab === 'preview' ? (
            <PanelPreview doc={shownDoc} locale={locale} resolveMedia={resolveMedia} width={SIDE_WIDTH - 34} number={story.panels.findIndex((candidate) => candidate.id === panel.id) + 1} />
          ) : sideTab === 'comments' ? (
            shownRevision ? (
              <DraftComments revision={shownRevision} panelId={panel.id} doc={shownDoc} locale={locale} />
            ) : (
              <Text className={styles.muted}>{draftComments.isError ? t('draftComments.loadError') : t('draftComments.noRevision')}</Text>
            )
          ) : phrase && !readOnly ? (
            <LivePhraseSettings editor={editor} phrase={phrase} doc={doc} />
          ) : widget ? (
            <>
              {widgets.length > 1 ? (
                <Field label={t('editor.widget.which')}>
                  <Select value={widget.widgetId} onChange={(_event, data) => setChosenWidget(data.value)}>
                    {widgets.map((candidate, index) => (
                      <option key={candidate.widgetId} value={candidate.widgetId}>{`${index + 1}. ${t(`widgetTypes.${candidate.widgetType as WidgetType}`)}`}</option>
                    ))}
                  </Select>
                </Field>
              ) : (
                <Text weight="semibold">{t(`widgetTypes.${widget.widgetType as WidgetType}`)}</Text>
              )}
              {readOnly ? null : <WidgetSettings key={widget.widgetId} editor={editor} widget={widget} />}
            </>
          ) : (
            <Text className={styles.muted}>{t('editor.widget.none')}</Text>
          )}
        </div>
      </aside>

      {dialog === 'image' ? <MediaPickerDialog locale={locale} onPick={pick} onClose={() => setDialog(null)} /> : null}
      {dialog === 'link' ? <LinkDialog editor={editor} onClose={() => setDialog(null)} /> : null}
      {dialog === 'conflict' && autosave.state.status === 'conflict' ? (
        <ConflictDialog
          theirs={autosave.state.theirs}
          mine={doc}
          locale={locale}
          onKeepMine={() => { setDialog(null); autosave.keepMine(); }}
          onTakeTheirs={takeTheirs}
          onClose={() => setDialog(null)}
        />
      ) : null}
    </div>
  );
}

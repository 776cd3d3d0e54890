import {
  Menu, MenuButton, MenuItem, MenuList, MenuPopover, MenuTrigger, Toolbar, ToolbarButton, ToolbarDivider, ToolbarToggleButton, Tooltip,
} from '@fluentui/react-components';
import {
  ArrowRedoRegular, ArrowUndoRegular, ImageAddRegular, LinkRegular, NumberSymbolRegular, TextBoldRegular, TextBulletListLtrRegular,
  TextHeader2Regular, TextHeader3Regular, TextItalicRegular, TextNumberListLtrRegular, TextQuoteRegular, BeakerAddRegular, TextEditStyleRegular,
} from '@fluentui/react-icons';
import { useEditorState, type Editor } from '@tiptap/react';
import { liveValueText, PANEL_HEADING_LEVELS, phraseStatesOf, WIDGET_TYPES, widgetOutputChoices, widgetRegistry, widgetsIn, type WidgetOutputChoice, type WidgetType } from '@mantlepiece/shared';
import type { ReactElement } from 'react';
import { useTranslation } from 'react-i18next';
import { insertionChain } from './insert-point';
import { stateWord } from './live-phrase-states';
import { useLiveValueLabel } from './live-value-labels';

const HEADING_ICONS: Record<(typeof PANEL_HEADING_LEVELS)[number], ReactElement> = { 2: <TextHeader2Regular />, 3: <TextHeader3Regular /> };

/** Formatting a panel uses, and the things a curator inserts: images, widgets and live values. */
export function EditorToolbar({ editor, locale: storyLocale, onPickImage, onEditLink }: { editor: Editor; locale: string; onPickImage: () => void; onEditLink: () => void }) {
  const { t, i18n } = useTranslation();
  const outputLabel = useLiveValueLabel();
  const state = useEditorState({
    editor,
    selector: ({ editor: current }) => ({
      bold: current.isActive('bold'),
      italic: current.isActive('italic'),
      link: current.isActive('link'),
      bulletList: current.isActive('bulletList'),
      orderedList: current.isActive('orderedList'),
      blockquote: current.isActive('blockquote'),
      headings: PANEL_HEADING_LEVELS.map((level) => current.isActive('heading', { level })),
      canUndo: current.can().undo(),
      canRedo: current.can().redo(),
      widgets: widgetsIn(current.getJSON()),
    }),
  });
  const checked = {
    format: [state.bold && 'bold', state.italic && 'italic', state.link && 'link'].filter(Boolean) as string[],
    block: [
      ...PANEL_HEADING_LEVELS.filter((_level, index) => state.headings[index]).map((level) => `h${level}`),
      state.bulletList && 'bulletList',
      state.orderedList && 'orderedList',
      state.blockquote && 'blockquote',
    ].filter(Boolean) as string[],
  };
  const chain = () => editor.chain().focus();
  const insertWidget = (type: WidgetType) => insertionChain(editor).insertWidget({ widgetType: type, params: { ...widgetRegistry[type].defaults } }).run();
  const locale = i18n.resolvedLanguage ?? 'en';
  // A new phrase starts with each state's own word in the story's language, ready to be reworded.
  const insertLivePhrase = (widgetId: string, states: readonly string[]) =>
    insertionChain(editor).insertLivePhrase({ widgetId, wordings: Object.fromEntries(states.map((state) => [state, stateWord(state, storyLocale)])) }).run();
  const phraseWidgets = state.widgets.map((widget, index) => ({ widget, index, states: phraseStatesOf(widget) })).filter(({ states }) => states.length > 0);
  // What the menu shows beside an output: its value now, or, for one the running simulation reports, its unit and "live".
  const preview = (choice: WidgetOutputChoice) => {
    if (choice.source === 'simulation') return [t('editor.liveFromSimulation'), choice.unit].filter(Boolean).join(' · ');
    const reading = typeof choice.value === 'number' ? { ok: true as const, value: choice.value } : { ok: true as const, state: choice.value! };
    return liveValueText(reading, { digits: 4, unit: choice.unit }, locale);
  };

  const toggle = (name: string, value: string, label: string, icon: ReactElement, run: () => void) => (
    <Tooltip content={label} relationship="label" withArrow>
      <ToolbarToggleButton aria-label={label} name={name} value={value} icon={icon} appearance="subtle" onClick={run} />
    </Tooltip>
  );

  return (
    <Toolbar aria-label={t('editor.toolbar')} checkedValues={checked} size="small">
      {toggle('format', 'bold', t('editor.bold'), <TextBoldRegular />, () => chain().toggleBold().run())}
      {toggle('format', 'italic', t('editor.italic'), <TextItalicRegular />, () => chain().toggleItalic().run())}
      {toggle('format', 'link', t('editor.link'), <LinkRegular />, onEditLink)}
      <ToolbarDivider />
      {PANEL_HEADING_LEVELS.map((level) => (
        <span key={level}>{toggle('block', `h${level}`, t('editor.heading', { level }), HEADING_ICONS[level], () => chain().toggleHeading({ level }).run())}</span>
      ))}
      {toggle('block', 'bulletList', t('editor.bulletList'), <TextBulletListLtrRegular />, () => chain().toggleBulletList().run())}
      {toggle('block', 'orderedList', t('editor.orderedList'), <TextNumberListLtrRegular />, () => chain().toggleOrderedList().run())}
      {toggle('block', 'blockquote', t('editor.blockquote'), <TextQuoteRegular />, () => chain().toggleBlockquote().run())}
      <ToolbarDivider />
      <ToolbarButton icon={<ImageAddRegular />} onClick={onPickImage}>{t('editor.image')}</ToolbarButton>
      <Menu>
        <MenuTrigger disableButtonEnhancement>
          <MenuButton appearance="subtle" size="small" icon={<BeakerAddRegular />}>{t('editor.widgetMenu')}</MenuButton>
        </MenuTrigger>
        <MenuPopover>
          <MenuList>
            {WIDGET_TYPES.map((type) => <MenuItem key={type} onClick={() => insertWidget(type)}>{t(`widgetTypes.${type}`)}</MenuItem>)}
          </MenuList>
        </MenuPopover>
      </Menu>
      <Menu>
        <MenuTrigger disableButtonEnhancement>
          <MenuButton appearance="subtle" size="small" icon={<NumberSymbolRegular />} disabled={state.widgets.length === 0}>
            {t('editor.liveValueMenu')}
          </MenuButton>
        </MenuTrigger>
        <MenuPopover>
          <MenuList>
            {state.widgets.flatMap((widget, index) =>
              (widgetOutputChoices(widget.widgetType, widget.params) ?? []).map((choice) => (
                <MenuItem
                  key={`${widget.widgetId}.${choice.name}`}
                  secondaryContent={preview(choice)}
                  onClick={() => insertionChain(editor).insertLiveValue({ widgetId: widget.widgetId, output: choice.name, format: { digits: 3, unit: choice.unit } }).run()}
                >
                  {outputLabel(choice.name)}
                  {state.widgets.length > 1 ? ` · ${t(`widgetTypes.${widget.widgetType as WidgetType}`)} ${index + 1}` : ''}
                </MenuItem>
              )),
            )}
          </MenuList>
        </MenuPopover>
      </Menu>
      <Menu>
        <MenuTrigger disableButtonEnhancement>
          <MenuButton appearance="subtle" size="small" icon={<TextEditStyleRegular />} disabled={phraseWidgets.length === 0}>
            {t('livePhrase.menu')}
          </MenuButton>
        </MenuTrigger>
        <MenuPopover>
          <MenuList>
            {phraseWidgets.map(({ widget, index, states }) => (
              <MenuItem key={widget.widgetId} secondaryContent={states.map((name) => stateWord(name, locale)).join(' / ')} onClick={() => insertLivePhrase(widget.widgetId, states)}>
                {`${t(`widgetTypes.${widget.widgetType as WidgetType}`)} ${index + 1}`}
              </MenuItem>
            ))}
          </MenuList>
        </MenuPopover>
      </Menu>
      <ToolbarDivider />
      <Tooltip content={t('editor.undo')} relationship="label" withArrow>
        <ToolbarButton aria-label={t('editor.undo')} icon={<ArrowUndoRegular />} disabled={!state.canUndo} onClick={() => chain().undo().run()} />
      </Tooltip>
      <Tooltip content={t('editor.redo')} relationship="label" withArrow>
        <ToolbarButton aria-label={t('editor.redo')} icon={<ArrowRedoRegular />} disabled={!state.canRedo} onClick={() => chain().redo().run()} />
      </Tooltip>
    </Toolbar>
  );
}

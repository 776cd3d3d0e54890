import { useEffect, useRef, useState, type KeyboardEvent } from 'react';
import { Button, Field, makeStyles, MessageBar, MessageBarBody, Text, Textarea, tokens } from '@fluentui/react-components';
import { ArrowDownRegular, ArrowUpRegular, SaveRegular } from '@fluentui/react-icons';
import { checkPlaceholders, directionOf, runsFromText, visibleLength, type Placeholder, type TranslationConflictBody, type TranslationUnitView } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { ApiError } from '../../api/client';
import { useReloadUnits, useSaveTranslationUnit, type TranslationTarget } from '../../api/translations';
import { describeError } from '../forms/describe-error';
import { FormAlert } from '../forms/FormAlert';
import { LengthBudget } from './LengthBudget';
import { PlaceholderChips } from './PlaceholderChips';
import { PlaceholderText } from './PlaceholderText';
import { insertPlaceholder, placeholderUses } from './placeholders';
import { StaleSource } from './StaleSource';
import { UnitConflict } from './UnitConflict';

const useStyles = makeStyles({
  root: {
    display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM, padding: tokens.spacingHorizontalL,
    border: `1px solid ${tokens.colorNeutralStroke2}`, borderRadius: tokens.borderRadiusLarge, backgroundColor: tokens.colorNeutralBackground1,
  },
  head: { display: 'flex', alignItems: 'center', justifyContent: 'space-between', gap: tokens.spacingHorizontalM, flexWrap: 'wrap' },
  heading: { margin: 0 },
  sides: { display: 'grid', gridTemplateColumns: 'repeat(auto-fit, minmax(16rem, 1fr))', gap: tokens.spacingHorizontalL, alignItems: 'start' },
  column: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  label: { color: tokens.colorNeutralForeground3 },
  source: { padding: tokens.spacingHorizontalS, borderRadius: tokens.borderRadiusMedium, backgroundColor: tokens.colorNeutralBackground2 },
  readsAs: { padding: tokens.spacingHorizontalS, borderRadius: tokens.borderRadiusMedium, border: `1px dashed ${tokens.colorNeutralStroke2}`, minHeight: '1.5em' },
  problems: { margin: 0, paddingLeft: tokens.spacingHorizontalXL },
  actions: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalS, flexWrap: 'wrap' },
  spacer: { flexGrow: 1 },
  keys: { color: tokens.colorNeutralForeground3 },
});

export interface UnitEditorProps {
  unit: TranslationUnitView;
  target: TranslationTarget;
  sourceLocale: string;
  languageName: (locale: string) => string;
  heading: string;
  /** The translator's text not yet saved, kept by the page so moving between units loses nothing. */
  draft: string | undefined;
  onDraft: (text: string | undefined) => void;
  canWrite: boolean;
  autoFocus: boolean;
  onMove: (step: -1 | 1) => void;
  canMove: { previous: boolean; next: boolean };
}

/**
 * Source beside target for one unit. The target is a plain text field in the display form with the
 * placeholders as chips above it: a native field keeps undo, input methods, spell checking and
 * screen readers working in every script, and every keystroke is checked with the same
 * `checkPlaceholders` the server runs, so a broken placeholder is caught before a save.
 */
export function UnitEditor({ unit, target, sourceLocale, languageName, heading, draft, onDraft, canWrite, autoFocus, onMove, canMove }: UnitEditorProps) {
  const { t } = useTranslation();
  const styles = useStyles();
  const field = useRef<HTMLTextAreaElement>(null);
  const save = useSaveTranslationUnit(target);
  const reload = useReloadUnits(target);
  const [conflict, setConflict] = useState<TranslationConflictBody | null>(null);
  const dir = directionOf(target.locale);
  const sourceDir = directionOf(sourceLocale);

  const text = draft ?? unit.target ?? '';
  const runs = runsFromText(unit, text);
  const problems = text === '' ? [] : checkPlaceholders(unit, runs);
  const uses = placeholderUses(unit, text);
  const dirty = draft !== undefined && draft !== (unit.target ?? '');

  useEffect(() => {
    if (autoFocus) field.current?.focus();
  }, [autoFocus]);

  const send = (version: number, andNext: boolean) => {
    setConflict(null);
    save.mutate(
      { unitId: unit.unitId, text, version },
      {
        onSuccess: () => {
          onDraft(undefined);
          if (andNext) onMove(1);
        },
        onError: (error) => {
          if (error instanceof ApiError && error.status === 409) setConflict(error.body as TranslationConflictBody);
        },
      },
    );
  };
  const ready = canWrite && problems.length === 0 && !save.isPending && (dirty || unit.status !== 'translated');
  const submit = (andNext: boolean) => {
    if (ready) send(unit.version, andNext);
    else if (andNext && !dirty && problems.length === 0) onMove(1);
  };

  const insert = (placeholder: Placeholder) => {
    const element = field.current;
    const selection = element ? { start: element.selectionStart, end: element.selectionEnd } : { start: text.length, end: text.length };
    const next = insertPlaceholder(text, selection, placeholder);
    onDraft(next.text);
    requestAnimationFrame(() => {
      element?.focus();
      element?.setSelectionRange(next.cursor, next.cursor);
    });
  };

  const onKeyDown = (event: KeyboardEvent) => {
    if (event.key === 'Enter' && (event.ctrlKey || event.metaKey)) {
      event.preventDefault();
      submit(true);
    } else if (event.altKey && (event.key === 'ArrowDown' || event.key === 'ArrowUp')) {
      event.preventDefault();
      onMove(event.key === 'ArrowDown' ? 1 : -1);
    }
  };

  const serverProblems = save.error instanceof ApiError && save.error.status === 400 ? save.error.errors : [];
  return (
    <section className={styles.root} aria-label={t('unitEditor.label')} onKeyDown={onKeyDown} data-unit-editor={unit.unitId} data-unit-status={unit.status}>
      <div className={styles.head}>
        <Text as="h2" size={400} weight="semibold" className={styles.heading}>{heading}</Text>
        <div className={styles.actions}>
          <Button size="small" appearance="subtle" icon={<ArrowUpRegular />} disabled={!canMove.previous} onClick={() => onMove(-1)} aria-keyshortcuts="Alt+ArrowUp">{t('unitEditor.previous')}</Button>
          <Button size="small" appearance="subtle" icon={<ArrowDownRegular />} disabled={!canMove.next} onClick={() => onMove(1)} aria-keyshortcuts="Alt+ArrowDown">{t('unitEditor.next')}</Button>
        </div>
      </div>
      {unit.status === 'stale' && unit.previousSource !== null ? (
        <>
          <MessageBar intent="warning"><MessageBarBody>{t('unitEditor.sourceChanged')}</MessageBarBody></MessageBar>
          <StaleSource previous={unit.previousSource} current={unit.source} locale={sourceLocale} />
        </>
      ) : null}
      <div className={styles.sides}>
        <div className={styles.column}>
          <Text size={200} weight="semibold" className={styles.label} id={`source-${unit.unitId}`}>{t('unitEditor.source', { language: languageName(sourceLocale) })}</Text>
          <div className={styles.source} data-unit-source>
            <PlaceholderText text={unit.source} placeholders={unit.placeholders} locale={sourceLocale} dir={sourceDir} />
          </div>
        </div>
        <div className={styles.column}>
          <PlaceholderChips placeholders={unit.placeholders} uses={uses} onInsert={insert} />
          <Field label={t('unitEditor.target', { language: languageName(target.locale) })} validationState={problems.length > 0 ? 'error' : 'none'}>
            <Textarea
              ref={field}
              value={text}
              onChange={(_event, data) => onDraft(data.value)}
              lang={target.locale}
              dir={dir}
              resize="vertical"
              rows={4}
              readOnly={!canWrite}
              aria-describedby={`source-${unit.unitId}`}
              aria-keyshortcuts="Control+Enter Alt+ArrowUp Alt+ArrowDown"
            />
          </Field>
          <LengthBudget length={visibleLength(runs, unit.placeholders)} budget={unit.budget} kind={unit.kind} />
          {text ? (
            <div>
              <Text size={200} weight="semibold" className={styles.label}>{t('unitEditor.readsAs')}</Text>
              <div className={styles.readsAs}><PlaceholderText text={text} placeholders={unit.placeholders} locale={target.locale} dir={dir} /></div>
            </div>
          ) : null}
          {problems.length > 0 ? (
            <div role="status" data-placeholder-problems>
              <Text size={200} weight="semibold">{t('unitEditor.problems')}</Text>
              <ul className={styles.problems}>{problems.map((problem, index) => <li key={index}>{problem.message}</li>)}</ul>
            </div>
          ) : null}
        </div>
      </div>
      {conflict ? (
        <UnitConflict
          conflict={conflict}
          mine={text}
          placeholders={unit.placeholders}
          dir={dir}
          locale={target.locale}
          onTakeTheirs={() => { setConflict(null); onDraft(undefined); void reload(); }}
          onKeepMine={() => send(conflict.currentVersion, false)}
        />
      ) : null}
      {save.isError && !conflict ? (
        <>
          <FormAlert intent="error">{`${t('unitEditor.saveError')} ${describeError(t, save.error)}`}</FormAlert>
          {serverProblems.length > 0 ? <ul className={styles.problems}>{serverProblems.map((problem, index) => <li key={index}>{problem.message}</li>)}</ul> : null}
        </>
      ) : null}
      {canWrite ? (
        <div className={styles.actions}>
          <Button appearance="primary" icon={<SaveRegular />} disabled={!ready} onClick={() => submit(true)} aria-keyshortcuts="Control+Enter">{t('unitEditor.saveAndNext')}</Button>
          <Button disabled={!ready} onClick={() => submit(false)}>{t('unitEditor.save')}</Button>
          <Text size={200} aria-live="polite" data-save-state={save.isPending ? 'saving' : dirty ? 'unsaved' : save.isSuccess ? 'saved' : 'idle'}>
            {save.isPending ? t('unitEditor.saving') : dirty ? t('unitEditor.unsaved') : save.isSuccess ? t('unitEditor.saved') : null}
          </Text>
          <span className={styles.spacer} />
          <Text size={200} className={styles.keys}>{t('unitEditor.keys')}</Text>
        </div>
      ) : null}
    </section>
  );
}

import { useState } from 'react';
import { Button, makeStyles, mergeClasses, shorthands, Text, tokens } from '@fluentui/react-components';
import { ArrowDownloadRegular, DocumentArrowUpRegular } from '@fluentui/react-icons';
import type { LengthBudgetWarning, TranslationCan, XliffImportResult } from '@mantlepiece/shared';
import { useDropzone, type FileRejection } from 'react-dropzone';
import { useTranslation } from 'react-i18next';
import { ApiError } from '../../api/client';
import { useDownloadXliff, useUploadXliff, type TranslationTarget } from '../../api/translations';
import { describeError } from '../forms/describe-error';
import { FormAlert } from '../forms/FormAlert';
import { TextLink } from '../links';
import { saveFile } from '../save-file';

/** What the file chooser offers; the server decides from the content, this only steers the chooser. */
const ACCEPT = { 'application/xliff+xml': ['.xlf', '.xliff'], 'application/x-xliff+xml': ['.xlf', '.xliff'] };

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  row: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalM, flexWrap: 'wrap' },
  hint: { color: tokens.colorNeutralForeground3 },
  zone: {
    display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalM, flexWrap: 'wrap', padding: `${tokens.spacingVerticalS} ${tokens.spacingHorizontalM}`,
    border: `2px dashed ${tokens.colorNeutralStroke1}`, borderRadius: tokens.borderRadiusLarge, backgroundColor: tokens.colorNeutralBackground1,
  },
  active: { ...shorthands.borderColor(tokens.colorBrandStroke1), backgroundColor: tokens.colorBrandBackground2 },
  problems: { margin: 0, paddingLeft: tokens.spacingHorizontalXL, color: tokens.colorPaletteRedForeground1, maxHeight: '12rem', overflow: 'auto' },
  warnings: { margin: 0, paddingLeft: tokens.spacingHorizontalXL, maxHeight: '12rem', overflow: 'auto' },
});

type Outcome = { kind: 'imported'; result: XliffImportResult } | { kind: 'refused'; message: string; problems: string[] } | { kind: 'wrongType' };

/** Download of the story's XLIFF through the API client (with the token) and upload by chooser or drop, each as the target's `can` allows. */
export function XliffExchange({ target, can }: { target: TranslationTarget; can: Pick<TranslationCan, 'import' | 'export'> }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const download = useDownloadXliff(target);
  const upload = useUploadXliff(target);
  const [outcome, setOutcome] = useState<Outcome | null>(null);

  const take = (accepted: File[], rejected: FileRejection[]) => {
    const file = accepted[0];
    if (!file) {
      if (rejected.length > 0) setOutcome({ kind: 'wrongType' });
      return;
    }
    setOutcome(null);
    upload.mutate(file, {
      onSuccess: (result) => setOutcome({ kind: 'imported', result }),
      onError: (error) =>
        setOutcome({
          kind: 'refused',
          message: describeError(t, error),
          // Each problem names its unit and place in words; the path repeats it in code form.
          problems: error instanceof ApiError ? error.errors.map((problem) => problem.message) : [],
        }),
    });
  };
  const { getRootProps, getInputProps, isDragActive, open } = useDropzone({ onDrop: take, accept: ACCEPT, multiple: false, noClick: true, noKeyboard: true, preventDropOnDocument: true, disabled: !can.import });

  const save = () =>
    download.mutate(undefined, { onSuccess: (blob) => saveFile(blob, `story-${target.storyId}.${target.locale}.xlf`) });

  return (
    <section className={styles.root} aria-label={t('xliff.title')}>
      <div className={styles.row}>
        <Text weight="semibold">{t('xliff.title')}</Text>
        <Text size={200} className={styles.hint}>{t('xliff.hint')}</Text>
      </div>
      <div className={styles.row}>
        {can.export ? (
          <Button icon={<ArrowDownloadRegular />} onClick={save} disabled={download.isPending}>
            {download.isPending ? t('xliff.downloading') : t('xliff.download')}
          </Button>
        ) : null}
        {can.import ? (
          <div {...getRootProps()} className={mergeClasses(styles.zone, isDragActive && styles.active)} data-xliff-dropzone>
            <input {...getInputProps()} aria-label={t('xliff.choose')} data-testid="xliff-file-input" />
            <DocumentArrowUpRegular aria-hidden="true" />
            <Text>{upload.isPending ? t('xliff.uploading') : t('xliff.drop')}</Text>
            <Button size="small" onClick={open} disabled={upload.isPending}>{t('xliff.choose')}</Button>
          </div>
        ) : null}
      </div>
      {download.isError ? <FormAlert intent="error">{`${t('xliff.downloadError')} ${describeError(t, download.error)}`}</FormAlert> : null}
      {outcome?.kind === 'imported' ? <FormAlert intent="success">{t('xliff.result', { ...outcome.result })}</FormAlert> : null}
      {outcome?.kind === 'imported' && outcome.result.warnings.length > 0 ? <OverBudget warnings={outcome.result.warnings} /> : null}
      {outcome?.kind === 'wrongType' ? <FormAlert intent="error">{t('xliff.wrongType')}</FormAlert> : null}
      {outcome?.kind === 'refused' ? (
        <div role="alert" data-xliff-problems>
          <FormAlert intent="error">{outcome.problems.length > 0 ? t('xliff.refused') : `${t('xliff.refused')} ${outcome.message}`}</FormAlert>
          {outcome.problems.length > 0 ? <ul className={styles.problems}>{outcome.problems.map((problem, index) => <li key={index}>{problem}</li>)}</ul> : null}
        </div>
      ) : null}
    </section>
  );
}

/** Units the file took over their length budget, each a link that opens it in the editor to shorten it. */
function OverBudget({ warnings }: { warnings: readonly LengthBudgetWarning[] }) {
  const { t } = useTranslation();
  const styles = useStyles();
  return (
    <div data-xliff-warnings>
      <FormAlert intent="warning">{t('xliff.overBudget')}</FormAlert>
      <ul className={styles.warnings}>
        {warnings.map((warning) => (
          <li key={warning.unitId} data-xliff-warning={warning.unitId}>
            <TextLink to={{ search: `?unit=${encodeURIComponent(warning.unitId)}` }}>
              {t('unitEditor.heading', {
                where: warning.panelNumber === null ? t('workspace.image') : t('workspace.panelNumber', { number: warning.panelNumber }),
                kind: t(`workspace.kinds.${warning.kind}`),
              })}
            </TextLink>
            {` — ${t(warning.kind === 'altText' ? 'unitEditor.overBudgetAltText' : 'unitEditor.overBudget', { over: warning.length - warning.budget, budget: warning.budget })}`}
          </li>
        ))}
      </ul>
    </div>
  );
}

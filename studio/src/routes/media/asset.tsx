import { useState, type FormEvent } from 'react';
import {
  Button, Combobox, Field, Input, makeStyles, Option, Radio, RadioGroup, Spinner, Text, Textarea, tokens,
} from '@fluentui/react-components';
import { directionOf, lookupText, type MediaView } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useNavigate, useParams } from 'react-router-dom';
import { ApiError } from '../../api/client';
import { useDeleteMedia, useLicenceIds, useMediaAsset, useRestoreMedia, useUpdateMedia } from '../../api/media';
import { ConfirmDialog } from '../../components/ConfirmDialog';
import { useOfferUndo } from '../../components/UndoToaster';
import { EmptyState } from '../../components/EmptyState';
import { FormAlert } from '../../components/forms/FormAlert';
import { LanguagePicker } from '../../components/forms/LanguagePicker';
import { useLanguageName } from '../../components/translation/language-name';
import { describeError, serverFieldMessage } from '../../components/forms/describe-error';
import { hasProblems } from '../../components/forms/validation';
import { useDateFormat } from '../../components/formatting';
import { LinkButton, TextLink } from '../../components/links';
import { PageHeader } from '../../components/PageHeader';
import { ASSET_FIELDS, assetChanges, assetProblems, assetValues, type AssetValues } from './asset-form';
import { formatBytes } from './media-facts';
import { licenceSuggestions } from './licence';
import { MediaBadges } from './MediaBadges';
import { RenditionPreparation } from './RenditionPreparation';

const useStyles = makeStyles({
  layout: { display: 'grid', gridTemplateColumns: 'minmax(0, 1fr) minmax(20rem, 32rem)', gap: tokens.spacingHorizontalXXL, alignItems: 'start', '@media (max-width: 1100px)': { gridTemplateColumns: 'minmax(0, 1fr)' } },
  figure: { margin: 0, display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  image: { width: '100%', maxHeight: '70vh', objectFit: 'contain', backgroundColor: tokens.colorNeutralBackground4, borderRadius: tokens.borderRadiusLarge, backgroundSize: 'cover' },
  muted: { color: tokens.colorNeutralForeground3 },
  form: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  fieldset: { border: `1px solid ${tokens.colorNeutralStroke2}`, borderRadius: tokens.borderRadiusMedium, padding: tokens.spacingHorizontalM, margin: 0, display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  legend: { fontWeight: tokens.fontWeightSemibold, padding: `0 ${tokens.spacingHorizontalXS}` },
  actions: { display: 'flex', justifyContent: 'space-between', gap: tokens.spacingHorizontalM },
  usage: { margin: 0, paddingLeft: tokens.spacingHorizontalL, display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXS },
});

/** The languages alt text is edited in: those the image needs (the server says which), those already written, and any added here. */
const altLocalesOf = (asset: MediaView, added: readonly string[]): string[] => [...new Set([...asset.altLocales, ...Object.keys(asset.alt), ...added])];

export function MediaAssetPage() {
  const { t } = useTranslation();
  const { id } = useParams();
  const asset = useMediaAsset(Number(id));
  if (asset.isPending) return <Spinner label={t('common.loading')} />;
  if (asset.isError) {
    const missing = asset.error instanceof ApiError && asset.error.status === 404;
    return (
      <EmptyState title={missing ? t('asset.notFound') : t('asset.loadError')} actions={<LinkButton to="/media">{t('asset.backToMedia')}</LinkButton>}>
        {missing ? t('asset.notFoundBody') : describeError(t, asset.error)}
      </EmptyState>
    );
  }
  return <AssetDetails key={asset.data.id} asset={asset.data} />;
}

/** Enough to choose from at a glance; typing more narrows the list. */
const MAX_LICENCE_SUGGESTIONS = 12;

function AssetDetails({ asset }: { asset: MediaView }) {
  const { t, i18n } = useTranslation();
  const styles = useStyles();
  const navigate = useNavigate();
  const formatDate = useDateFormat();
  const writer = asset.can.edit;
  const update = useUpdateMedia(asset.id);
  const remove = useDeleteMedia();
  const restore = useRestoreMedia();
  const licenceIds = useLicenceIds();
  const offerUndo = useOfferUndo();
  const [values, setValues] = useState<AssetValues>(() => assetValues(asset));
  const [problems, setProblems] = useState<ReturnType<typeof assetProblems>>({});
  const [confirming, setConfirming] = useState(false);
  const [saved, setSaved] = useState(false);
  // Typing opens the licence suggestions, as a search box does; Fluent's combobox opens only on click or arrow keys.
  const [suggesting, setSuggesting] = useState(false);
  const [addedLocales, setAddedLocales] = useState<string[]>([]);
  const locales = altLocalesOf(asset, addedLocales);
  const languageName = useLanguageName();
  const languageLabel = (locale: string) => `${languageName(locale)} (${locale})`;
  /** The written alt text lookup would use for an empty field (en for en-GB), said beside it. */
  const servedBy = (locale: string) => (values.alt[locale]?.trim() ? undefined : lookupText(values.alt, [locale])?.tag);
  const largest = [...asset.renditions].sort((a, b) => b.width - a.width)[0];
  const set = (changes: Partial<AssetValues>) => {
    setSaved(false);
    setValues((current) => ({ ...current, ...changes }));
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const found = assetProblems(t, values);
    setProblems(found);
    if (!hasProblems(found)) update.mutate(assetChanges(values), { onSuccess: (next) => { setValues(assetValues(next)); setSaved(true); } });
  };
  const message = (field: (typeof ASSET_FIELDS)[number]) => serverFieldMessage(update.error, field);
  // The server judges the licence as a whole; its message belongs at the box the curator filled in.
  const licenceMessage = message('licence');
  const spdxSuggestions = licenceSuggestions(licenceIds.data?.ids ?? [], values.spdxId, MAX_LICENCE_SUGGESTIONS);
  const unplaced = update.error && !ASSET_FIELDS.some((field) => message(field)) ? describeError(t, update.error) : null;
  const deleteProblem = remove.error instanceof ApiError && remove.error.status === 409 ? t('asset.inUse') : remove.error ? describeError(t, remove.error) : null;

  return (
    <>
      <PageHeader
        title={asset.filename}
        intro={<MediaBadges asset={asset} />}
        actions={asset.can.delete ? <Button onClick={() => setConfirming(true)}>{t('asset.delete')}</Button> : null}
      />
      <div className={styles.layout}>
        <figure className={styles.figure}>
          <RenditionPreparation asset={asset} canRetry={writer} />
          <img
            className={styles.image}
            src={largest?.url ?? asset.placeholder}
            srcSet={asset.renditions.map((rendition) => `${rendition.url} ${rendition.width}w`).join(', ') || undefined}
            sizes="(max-width: 1100px) 100vw, 60vw"
            alt={lookupText(values.alt, [i18n.resolvedLanguage, ...locales])?.text ?? ''}
            style={{ backgroundImage: `url("${asset.placeholder}")` }}
          />
          <Text size={200} className={styles.muted}>
            {t('asset.facts', { width: asset.width, height: asset.height, mime: asset.mime, size: formatBytes(asset.bytes, i18n.resolvedLanguage ?? 'en'), date: formatDate(asset.createdAt) })}
          </Text>
          {asset.renditions.length > 0 ? (
            <Text size={200} className={styles.muted}>{t('asset.renditions', { widths: asset.renditions.map((rendition) => rendition.width).join(', ') })}</Text>
          ) : null}
          <section aria-labelledby="usage-heading">
            <Text as="h2" block size={400} weight="semibold" id="usage-heading">{t('asset.usedIn')}</Text>
            {asset.usedIn.length === 0 ? (
              <Text as="p" className={styles.muted}>{t('asset.unused')}</Text>
            ) : (
              <ul className={styles.usage}>
                {asset.usedIn.map((usage) => (
                  <li key={usage.panelId}>
                    <TextLink to={`/stories/${usage.storyId}?panel=${usage.panelId}`}>{t('asset.usage', { story: usage.storyTitle, panel: usage.panelNumber })}</TextLink>
                  </li>
                ))}
              </ul>
            )}
          </section>
        </figure>

        <form className={styles.form} onSubmit={submit} noValidate aria-label={t('asset.rights')}>
          {saved ? <FormAlert intent="success">{t('asset.saved')}</FormAlert> : null}
          {unplaced ? <FormAlert intent="error">{unplaced}</FormAlert> : null}
          <fieldset className={styles.fieldset}>
            <legend className={styles.legend}>{t('asset.altTitle')}</legend>
            <Text size={200} className={styles.muted}>{t('asset.altHint')}</Text>
            {locales.map((locale) => {
              const served = servedBy(locale);
              return (
                <Field
                  key={locale}
                  label={t('asset.altIn', { locale: languageLabel(locale) })}
                  hint={served ? t('asset.altServedBy', { language: languageLabel(served) }) : undefined}
                  validationMessage={locale === locales[0] ? message('alt') : undefined}
                >
                  <Textarea lang={locale} dir={directionOf(locale)} value={values.alt[locale] ?? ''} readOnly={!writer} resize="vertical" rows={4} onChange={(_event, data) => set({ alt: { ...values.alt, [locale]: data.value } })} />
                </Field>
              );
            })}
            {writer ? (
              <Field label={t('asset.altAdd')}>
                <LanguagePicker value="" offered={locales} onChange={(locale) => setAddedLocales((current) => [...current, locale])} />
              </Field>
            ) : null}
          </fieldset>
          <fieldset className={styles.fieldset}>
            <legend className={styles.legend}>{t('asset.rights')}</legend>
            <Field label={t('asset.credit')} hint={t('asset.creditHint')} validationMessage={message('credit')}>
              <Input value={values.credit} readOnly={!writer} onChange={(_event, data) => set({ credit: data.value })} />
            </Field>
            <Field label={t('asset.licence')} validationMessage={values.licenceKind === 'none' ? licenceMessage : undefined}>
              <RadioGroup value={values.licenceKind} disabled={!writer} onChange={(_event, data) => set({ licenceKind: data.value as AssetValues['licenceKind'] })}>
                <Radio value="spdx" label={t('asset.licenceSpdx')} />
                <Radio value="all-rights-reserved" label={t('asset.licenceReserved')} />
                <Radio value="none" label={t('asset.licenceNone')} />
              </RadioGroup>
            </Field>
            {values.licenceKind === 'spdx' ? (
              <Field label={t('asset.spdxId')} hint={t('asset.spdxHint')} required validationMessage={problems.spdxId ?? licenceMessage}>
                <Combobox
                  freeform
                  disabled={!writer}
                  value={values.spdxId}
                  selectedOptions={spdxSuggestions.includes(values.spdxId) ? [values.spdxId] : []}
                  open={suggesting && spdxSuggestions.length > 0}
                  onOpenChange={(_event, data) => setSuggesting(data.open)}
                  onChange={(event) => { set({ spdxId: event.target.value }); setSuggesting(true); }}
                  // Fluent "clears the selection" (no optionValue) when the typed text starts none of the options
                  // still on screen ("M" while the common image licences show); what was typed stands.
                  onOptionSelect={(_event, data) => { if (data.optionValue !== undefined) set({ spdxId: data.optionValue }); }}
                >
                  {spdxSuggestions.map((id) => <Option key={id}>{id}</Option>)}
                </Combobox>
              </Field>
            ) : null}
            {values.licenceKind === 'all-rights-reserved' ? (
              <Field label={t('asset.holder')} required validationMessage={problems.holder ?? licenceMessage}>
                <Input value={values.holder} readOnly={!writer} onChange={(_event, data) => set({ holder: data.value })} />
              </Field>
            ) : null}
            <Field label={t('asset.expires')} hint={t('asset.expiresHint')} validationMessage={problems.licenceExpiresOn ?? message('licenceExpiresOn')}>
              <Input type="date" value={values.licenceExpiresOn} readOnly={!writer} onChange={(_event, data) => set({ licenceExpiresOn: data.value })} />
            </Field>
          </fieldset>
          {writer ? (
            <div className={styles.actions}>
              <LinkButton to="/media" appearance="subtle">{t('asset.backToMedia')}</LinkButton>
              <Button type="submit" appearance="primary" disabled={update.isPending}>{update.isPending ? t('common.saving') : t('common.save')}</Button>
            </div>
          ) : null}
        </form>
      </div>

      {confirming ? (
        <ConfirmDialog
          title={t('asset.deleteTitle', { name: asset.filename })}
          confirmLabel={t('asset.deleteConfirm')}
          pending={remove.isPending}
          problem={deleteProblem}
          onConfirm={() => remove.mutate(asset.id, {
            onSuccess: () => {
              void navigate('/media');
              offerUndo({ key: 'undo.imageDeleted', values: { name: asset.filename } }, () => restore.mutateAsync(asset.id));
            },
          })}
          onCancel={() => setConfirming(false)}
        >
          <Text as="p">{asset.usedIn.length > 0 ? t('asset.deleteUsed', { count: asset.usedIn.length }) : t('asset.deleteBody')}</Text>
        </ConfirmDialog>
      ) : null}
    </>
  );
}

import { useState } from 'react';
import {
  Button, Dialog, DialogActions, DialogBody, DialogContent, DialogSurface, DialogTitle, Field, makeStyles, mergeClasses, SearchBox, shorthands, Spinner, Text, Textarea, tokens,
} from '@fluentui/react-components';
import { lookupText, type MediaView } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useMediaList, useUpdateMedia } from '../../api/media';
import { FormAlert } from '../forms/FormAlert';
import { describeError } from '../forms/describe-error';
import { MediaDropzone } from '../media/MediaDropzone';
import { MediaThumb } from '../media/MediaThumb';
import { useDebounced } from '../use-debounced';

const useStyles = makeStyles({
  surface: { maxWidth: '64rem', width: 'calc(100vw - 48px)' },
  content: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  layout: { display: 'grid', gridTemplateColumns: 'minmax(0, 1fr) 18rem', gap: tokens.spacingHorizontalL, alignItems: 'start' },
  grid: { display: 'grid', gridTemplateColumns: 'repeat(auto-fill, minmax(8.5rem, 1fr))', gap: tokens.spacingHorizontalS, listStyle: 'none', padding: 0, margin: 0, maxHeight: '46vh', overflowY: 'auto' },
  tile: {
    display: 'flex', flexDirection: 'column', width: '100%', padding: 0, border: `2px solid transparent`, borderRadius: tokens.borderRadiusMedium, overflow: 'hidden',
    backgroundColor: tokens.colorNeutralBackground1, cursor: 'pointer', textAlign: 'start', font: 'inherit', color: 'inherit',
    ':focus-visible': { outline: `2px solid ${tokens.colorStrokeFocus2}`, outlineOffset: '1px' },
  },
  chosen: { ...shorthands.borderColor(tokens.colorBrandStroke1) },
  caption: { padding: `${tokens.spacingVerticalXXS} ${tokens.spacingHorizontalXS}`, overflow: 'hidden', textOverflow: 'ellipsis', whiteSpace: 'nowrap', fontSize: tokens.fontSizeBase200 },
  detail: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  muted: { color: tokens.colorNeutralForeground3 },
});

/**
 * Picks an image for a panel from the media library, or uploads one on the spot. The alt text for
 * the story's language is asked for here, because an image without it fails preflight later.
 */
export function MediaPickerDialog({ locale, onPick, onClose }: { locale: string; onPick: (asset: MediaView) => void; onClose: () => void }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const [query, setQuery] = useState('');
  const q = useDebounced(query.trim(), 300);
  const list = useMediaList({ page: 1, pageSize: 48, q: q || undefined, sort: '-createdAt' });
  const [chosen, setChosen] = useState<MediaView | null>(null);
  const [alt, setAlt] = useState('');
  const update = useUpdateMedia(chosen?.id ?? 0);

  // An en-GB story is served by the image's en alt text (RFC 4647 lookup); a change is written in the story's own language.
  const altFor = (asset: MediaView) => lookupText(asset.alt, [locale])?.text ?? '';
  const choose = (asset: MediaView) => {
    setChosen(asset);
    setAlt(altFor(asset));
    update.reset();
  };
  const insert = () => {
    if (!chosen) return;
    if (alt.trim() === altFor(chosen).trim()) {
      onPick(chosen);
      return;
    }
    update.mutate({ alt: { ...chosen.alt, [locale]: alt.trim() } }, { onSuccess: onPick });
  };

  return (
    <Dialog open modalType="modal" onOpenChange={(_event, data) => { if (!data.open) onClose(); }}>
      <DialogSurface className={styles.surface}>
        <DialogBody>
          <DialogTitle>{t('picker.title')}</DialogTitle>
          <DialogContent className={styles.content}>
            <MediaDropzone compact onUploaded={choose} />
            <Field label={t('picker.search')}>
              <SearchBox value={query} onChange={(_event, data) => setQuery(data.value)} />
            </Field>
            <div className={styles.layout}>
              <div>
                {list.isPending ? <Spinner label={t('common.loading')} /> : null}
                {list.isError ? <FormAlert intent="error">{describeError(t, list.error)}</FormAlert> : null}
                {list.isSuccess && list.data.items.length === 0 ? <Text className={styles.muted}>{t('picker.none')}</Text> : null}
                {list.isSuccess ? (
                  <ul className={styles.grid} aria-label={t('picker.assets')}>
                    {list.data.items.map((asset) => (
                      <li key={asset.id}>
                        <button
                          type="button"
                          className={mergeClasses(styles.tile, chosen?.id === asset.id && styles.chosen)}
                          aria-pressed={chosen?.id === asset.id}
                          onClick={() => choose(asset)}
                          onDoubleClick={() => onPick(asset)}
                        >
                          <MediaThumb asset={asset} alt="" />
                          <span className={styles.caption}>{asset.filename}</span>
                        </button>
                      </li>
                    ))}
                  </ul>
                ) : null}
              </div>
              <div className={styles.detail}>
                {chosen ? (
                  <>
                    <MediaThumb asset={chosen} alt={altFor(chosen)} />
                    <Text weight="semibold">{chosen.filename}</Text>
                    <Text size={200} className={styles.muted}>
                      {t('picker.size', { width: chosen.width, height: chosen.height })}
                      {chosen.credit ? ` · ${chosen.credit}` : ` · ${t('picker.noCredit')}`}
                    </Text>
                    <Field label={t('picker.alt', { locale })} hint={t('picker.altHint')} validationMessage={update.error ? describeError(t, update.error) : undefined}>
                      <Textarea value={alt} onChange={(_event, data) => setAlt(data.value)} resize="vertical" />
                    </Field>
                  </>
                ) : (
                  <Text className={styles.muted}>{t('picker.chooseOne')}</Text>
                )}
              </div>
            </div>
          </DialogContent>
          <DialogActions>
            <Button appearance="secondary" onClick={onClose}>{t('common.cancel')}</Button>
            <Button appearance="primary" disabled={!chosen || update.isPending} onClick={insert}>
              {update.isPending ? t('common.saving') : t('picker.insert')}
            </Button>
          </DialogActions>
        </DialogBody>
      </DialogSurface>
    </Dialog>
  );
}

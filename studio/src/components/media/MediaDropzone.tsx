import { useState } from 'react';
import { shorthands, Button, makeStyles, mergeClasses, ProgressBar, Text, tokens } from '@fluentui/react-components';
import { CloudArrowUpRegular } from '@fluentui/react-icons';
import type { MediaView } from '@mantlepiece/shared';
import type { TFunction } from 'i18next';
import { useDropzone } from 'react-dropzone';
import { useTranslation } from 'react-i18next';
import { ApiError } from '../../api/client';
import { useUploadMedia } from '../../api/media';
import { describeError } from '../forms/describe-error';

/** The types the server accepts; it decides from the bytes, this only steers the file chooser. */
const ACCEPT = { 'image/jpeg': [], 'image/png': [], 'image/webp': [], 'image/avif': [], 'image/tiff': [] };

interface Upload {
  key: string;
  name: string;
  progress: number;
  status: 'uploading' | 'done' | 'failed';
  message?: string;
}

const useStyles = makeStyles({
  zone: {
    display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalL, padding: `${tokens.spacingVerticalL} ${tokens.spacingHorizontalXL}`,
    border: `2px dashed ${tokens.colorNeutralStroke1}`, borderRadius: tokens.borderRadiusLarge, backgroundColor: tokens.colorNeutralBackground1, cursor: 'pointer',
    ':focus-visible': { outline: `2px solid ${tokens.colorStrokeFocus2}`, outlineOffset: '2px' },
  },
  active: { ...shorthands.borderColor(tokens.colorBrandStroke1), backgroundColor: tokens.colorBrandBackground2 },
  icon: { fontSize: '36px', color: tokens.colorBrandForeground1, display: 'flex' },
  text: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXXS },
  hint: { color: tokens.colorNeutralForeground3 },
  list: { listStyle: 'none', margin: `${tokens.spacingVerticalM} 0 0`, padding: 0, display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  item: { display: 'grid', gridTemplateColumns: 'minmax(8rem, 16rem) 1fr', gap: tokens.spacingHorizontalM, alignItems: 'center' },
  name: { overflow: 'hidden', textOverflow: 'ellipsis', whiteSpace: 'nowrap' },
  failed: { color: tokens.colorPaletteRedForeground1 },
});

function uploadProblem(t: TFunction, error: unknown): string {
  if (error instanceof ApiError && [413, 415, 422].includes(error.status)) {
    return t(`mediaUpload.refused${error.status as 413 | 415 | 422}`, { reason: error.message });
  }
  return describeError(t, error);
}

/**
 * Drop or choose images; each file uploads on its own with its own progress bar, and a file the
 * server refuses says why (too large, not an accepted image type, too many pixels).
 */
export function MediaDropzone({ onUploaded, compact = false }: { onUploaded?: (asset: MediaView) => void; compact?: boolean }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const upload = useUploadMedia();
  const [uploads, setUploads] = useState<Upload[]>([]);
  const update = (key: string, changes: Partial<Upload>) => setUploads((current) => current.map((item) => (item.key === key ? { ...item, ...changes } : item)));

  const start = (files: File[]) => {
    for (const file of files) {
      const key = `${file.name}-${file.size}-${Math.random().toString(36).slice(2)}`;
      setUploads((current) => [{ key, name: file.name, progress: 0, status: 'uploading' }, ...current]);
      upload.mutate(
        { file, onProgress: (progress) => update(key, { progress }) },
        {
          onSuccess: (asset) => {
            update(key, { status: 'done', progress: 1 });
            onUploaded?.(asset);
          },
          onError: (error) => update(key, { status: 'failed', message: uploadProblem(t, error) }),
        },
      );
    }
  };

  // `accept` only steers the file chooser: every file still goes to the server, whose answer (415 for
  // an SVG, say) is the one to show, because it reads the bytes rather than the name.
  const { getRootProps, getInputProps, isDragActive, open } = useDropzone({
    onDrop: (accepted, rejected) => start([...accepted, ...rejected.map((rejection) => rejection.file)]),
    accept: ACCEPT,
    noClick: true,
    noKeyboard: true,
    preventDropOnDocument: true,
  });
  const rootProps = getRootProps();

  return (
    <div>
      <div {...rootProps} className={mergeClasses(styles.zone, isDragActive && styles.active)} data-testid="media-dropzone">
        <input {...getInputProps()} aria-label={t('mediaUpload.choose')} data-testid="media-file-input" />
        <span className={styles.icon} aria-hidden="true"><CloudArrowUpRegular /></span>
        <span className={styles.text}>
          <Text weight="semibold">{isDragActive ? t('mediaUpload.dropNow') : t('mediaUpload.drop')}</Text>
          {compact ? null : <Text size={200} className={styles.hint}>{t('mediaUpload.hint')}</Text>}
        </span>
        <Button onClick={open}>{t('mediaUpload.choose')}</Button>
      </div>
      {uploads.length > 0 ? (
        <ul className={styles.list} aria-label={t('mediaUpload.uploads')}>
          {uploads.map((item) => (
            <li key={item.key} className={styles.item} data-upload-status={item.status}>
              <Text className={styles.name} title={item.name}>{item.name}</Text>
              {item.status === 'failed' ? (
                <Text role="alert" className={styles.failed}>{item.message}</Text>
              ) : (
                <ProgressBar
                  value={item.progress}
                  max={1}
                  color={item.status === 'done' ? 'success' : 'brand'}
                  aria-label={item.status === 'done' ? t('mediaUpload.done', { name: item.name }) : t('mediaUpload.progress', { name: item.name })}
                />
              )}
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}

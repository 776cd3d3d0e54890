import { useState } from 'react';
import {
  Button, Dialog, DialogActions, DialogBody, DialogContent, DialogSurface, DialogTitle, Field, makeStyles, MessageBar, MessageBarBody, MessageBarTitle,
  Radio, RadioGroup, Select, Spinner, Table, TableBody, TableCell, TableHeader, TableHeaderCell, TableRow, Text, tokens,
} from '@fluentui/react-components';
import type { MissingTranslationChoice } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { ApiError } from '../../api/client';
import { useBuildRelease, useReleaseCandidates, useReleasePreview, type ReleaseCandidate, type ReleaseRequest } from '../../api/releases';
import { useDateFormat } from '../../components/formatting';
import { FormAlert } from '../../components/forms/FormAlert';
import { describeError } from '../../components/forms/describe-error';
import { MissingTranslations } from '../../components/releases/MissingTranslations';
import { ReleaseProblems } from '../../components/releases/ReleaseProblems';

const useStyles = makeStyles({
  surface: { maxWidth: '56rem', width: '100%' },
  content: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  muted: { color: tokens.colorNeutralForeground3 },
});

const LEAVE_OUT = '';

/** By default each story's latest approved revision; chosen by hand, any approved revision or none. */
const defaultChoice = (candidates: ReleaseCandidate[]): Record<number, string> =>
  Object.fromEntries(candidates.map((candidate) => [candidate.story.id, candidate.approved[0] ? String(candidate.approved[0].id) : LEAVE_OUT]));

const storiesChoosing = (choices: Record<number, MissingTranslationChoice | null>, wanted: MissingTranslationChoice) =>
  Object.entries(choices).filter(([, choice]) => choice === wanted).map(([storyId]) => Number(storyId));

/**
 * Asks for a release after saying what it would carry: the server's preview lists the stories
 * whose translations are missing (each left out or shown in the source language, as the venue
 * allows), anything else that stops the build, and whether the build would equal the Live release.
 */
export function BuildReleaseDialog({ galleryId, galleryName, onBuilding, onClose }: {
  galleryId: number;
  galleryName: string;
  onBuilding: (releaseId: number) => void;
  onClose: () => void;
}) {
  const { t } = useTranslation();
  const styles = useStyles();
  const formatDate = useDateFormat();
  const [mode, setMode] = useState<'latest' | 'chosen'>('latest');
  const candidates = useReleaseCandidates(galleryId, mode === 'chosen');
  const [picked, setPicked] = useState<Record<number, string>>({});
  const [missingChoices, setMissingChoices] = useState<Record<number, MissingTranslationChoice | null>>({});
  const build = useBuildRelease(galleryId);
  const choice: Record<number, string> = { ...(candidates.data ? defaultChoice(candidates.data) : {}), ...picked };
  const revisionIds = Object.values(choice).filter((id) => id !== LEAVE_OUT).map(Number);
  const request: ReleaseRequest = {
    revisionIds: mode === 'latest' ? undefined : revisionIds,
    leaveOut: storiesChoosing(missingChoices, 'leave-out'),
    showInSource: storiesChoosing(missingChoices, 'show-in-source'),
  };
  const ready = mode === 'latest' || (candidates.isSuccess && revisionIds.length > 0);
  const preview = useReleasePreview(galleryId, request, ready);
  const sameAsLive = preview.data?.sameAsLive;

  const submit = () => build.mutate(request, { onSuccess: ({ id }) => onBuilding(id) });
  const changed = () => build.reset();

  return (
    <Dialog open onOpenChange={(_event, data) => { if (!data.open) onClose(); }}>
      <DialogSurface className={styles.surface}>
        <DialogBody>
          <DialogTitle>{t('releases.build.title', { gallery: galleryName })}</DialogTitle>
          <DialogContent className={styles.content}>
            <Field label={t('releases.build.which')}>
              <RadioGroup value={mode} onChange={(_event, data) => { setMode(data.value as 'latest' | 'chosen'); setMissingChoices({}); changed(); }}>
                <Radio value="latest" label={t('releases.build.latest')} />
                <Radio value="chosen" label={t('releases.build.chosen')} />
              </RadioGroup>
            </Field>
            {mode === 'chosen' ? (
              candidates.isPending ? <Spinner label={t('common.loading')} /> : candidates.isError ? (
                <FormAlert intent="error">{describeError(t, candidates.error)}</FormAlert>
              ) : candidates.data.length === 0 ? <Text className={styles.muted}>{t('releases.build.noStories')}</Text> : (
                <Table size="small" aria-label={t('releases.build.chosen')}>
                  <TableHeader>
                    <TableRow>
                      <TableHeaderCell>{t('releases.build.story')}</TableHeaderCell>
                      <TableHeaderCell>{t('releases.build.revision')}</TableHeaderCell>
                    </TableRow>
                  </TableHeader>
                  <TableBody>
                    {candidates.data.map(({ story, approved }) => (
                      <TableRow key={story.id}>
                        <TableCell>{story.title}</TableCell>
                        <TableCell>
                          <Select
                            aria-label={t('releases.build.revisionOf', { title: story.title })}
                            value={choice[story.id] ?? LEAVE_OUT}
                            onChange={(_event, data) => { setPicked((current) => ({ ...current, [story.id]: data.value })); changed(); }}
                          >
                            <option value={LEAVE_OUT}>{approved.length ? t('releases.build.leaveOut') : t('releases.build.noApproved')}</option>
                            {approved.map((revision) => (
                              <option key={revision.id} value={String(revision.id)}>
                                {t('releases.build.revisionOption', { number: revision.number, date: formatDate(revision.submittedAt) })}
                              </option>
                            ))}
                          </Select>
                        </TableCell>
                      </TableRow>
                    ))}
                  </TableBody>
                </Table>
              )
            ) : <Text className={styles.muted}>{t('releases.build.latestHint')}</Text>}
            {ready && preview.isPending ? <Spinner size="small" label={t('releases.build.checking')} /> : null}
            {preview.isError ? <FormAlert intent="error">{describeError(t, preview.error)}</FormAlert> : null}
            {preview.data ? (
              <>
                <MissingTranslations
                  preview={preview.data}
                  picked={missingChoices}
                  onChoose={(storyId, picked) => { setMissingChoices((current) => ({ ...current, [storyId]: picked })); changed(); }}
                />
                {preview.data.problems.length ? <ReleaseProblems title={t('releases.build.blocked')} errors={preview.data.problems} /> : null}
                {sameAsLive ? (
                  <MessageBar intent="warning" layout="multiline" data-same-as-live={sameAsLive.number}>
                    <MessageBarBody>
                      <MessageBarTitle>{t('releases.build.sameAsLiveTitle')}</MessageBarTitle>
                      {t('releases.build.sameAsLive', { name: t('releases.name', { number: sameAsLive.number }) })}
                    </MessageBarBody>
                  </MessageBar>
                ) : null}
              </>
            ) : null}
            {build.error instanceof ApiError && build.error.status === 422 ? <ReleaseProblems title={build.error.message} errors={build.error.errors} /> : null}
            {build.error && !(build.error instanceof ApiError && build.error.status === 422) ? <FormAlert intent="error">{describeError(t, build.error)}</FormAlert> : null}
          </DialogContent>
          <DialogActions>
            <Button appearance="secondary" onClick={onClose}>{t('common.cancel')}</Button>
            <Button appearance="primary" disabled={build.isPending || !ready || !preview.data?.buildable || preview.isFetching} onClick={submit}>
              {build.isPending ? t('releases.build.starting') : t('releases.build.submit')}
            </Button>
          </DialogActions>
        </DialogBody>
      </DialogSurface>
    </Dialog>
  );
}

import { Checkbox, makeStyles, Radio, RadioGroup, Table, TableBody, TableCell, TableHeader, TableHeaderCell, TableRow, Text, tokens } from '@fluentui/react-components';
import type { MissingTranslationChoice, ReleasePreview, ReleasePreviewStory } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useLanguageName } from '../translation/language-name';

const useStyles = makeStyles({
  section: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  gaps: { margin: 0, paddingInlineStart: tokens.spacingHorizontalL },
  muted: { color: tokens.colorNeutralForeground3 },
});

/**
 * Each story whose translations are missing, per locale how many texts, and what the build does
 * with it: the choices are the server's (the venue decides whether untranslated texts may be shown
 * in the source language), the technician picks one per story.
 */
export function MissingTranslations({ preview, picked, onChoose }: {
  preview: ReleasePreview;
  /** What the technician picked, shown at once while the preview of it is on its way. */
  picked: Record<number, MissingTranslationChoice | null>;
  onChoose: (storyId: number, choice: MissingTranslationChoice | null) => void;
}) {
  const { t } = useTranslation();
  const styles = useStyles();
  const languageName = useLanguageName({ standalone: true });
  const missing = preview.stories.filter((story) => story.missing.length > 0);
  if (missing.length === 0) return null;
  const source = languageName(preview.sourceLocale);
  return (
    <section className={styles.section} aria-labelledby="missing-translations-title">
      <Text as="h3" weight="semibold" id="missing-translations-title">{t('releases.missing.title', { count: missing.length })}</Text>
      <Text className={styles.muted}>{preview.fallbackToSource ? t('releases.missing.allowed', { language: source }) : t('releases.missing.notAllowed', { language: source })}</Text>
      <Table size="small" aria-labelledby="missing-translations-title">
        <TableHeader>
          <TableRow>
            <TableHeaderCell>{t('releases.build.story')}</TableHeaderCell>
            <TableHeaderCell>{t('releases.missing.what')}</TableHeaderCell>
            <TableHeaderCell>{t('releases.missing.choice')}</TableHeaderCell>
          </TableRow>
        </TableHeader>
        <TableBody>
          {missing.map((story) => (
            <TableRow key={story.storyId} data-story-id={story.storyId}>
              <TableCell><span id={titleId(story)}>{story.title}</span></TableCell>
              <TableCell>
                <ul className={styles.gaps}>
                  {story.missing.map((gap) => (
                    <li key={gap.locale}>
                      {t('releases.missing.gap', {
                        language: languageName(gap.locale),
                        counts: [
                          gap.untranslated ? t('releases.missing.untranslated', { count: gap.untranslated }) : null,
                          gap.stale ? t('releases.missing.stale', { count: gap.stale }) : null,
                        ].filter(Boolean).join(t('releases.missing.and')),
                        total: gap.total,
                      })}
                    </li>
                  ))}
                </ul>
              </TableCell>
              <TableCell><StoryChoice story={story} choice={story.storyId in picked ? (picked[story.storyId] ?? null) : story.choice} source={source} onChoose={(choice) => onChoose(story.storyId, choice)} /></TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </section>
  );
}

const titleId = (story: ReleasePreviewStory) => `missing-translations-story-${story.storyId}`;

/** Both choices as a pair of radios; leaving out alone, where the venue shows no source text, as a tick box. */
function StoryChoice({ story, choice, source, onChoose }: {
  story: ReleasePreviewStory;
  choice: MissingTranslationChoice | null;
  source: string;
  onChoose: (choice: MissingTranslationChoice | null) => void;
}) {
  const { t } = useTranslation();
  const label = (option: MissingTranslationChoice) => (option === 'leave-out' ? t('releases.missing.leaveOut') : t('releases.missing.showInSource', { language: source }));
  if (!story.choices.includes('show-in-source')) {
    return (
      <Checkbox
        checked={choice === 'leave-out'}
        label={label('leave-out')}
        aria-describedby={titleId(story)}
        onChange={(_event, data) => onChoose(data.checked ? 'leave-out' : null)}
      />
    );
  }
  return (
    <RadioGroup aria-labelledby={titleId(story)} value={choice ?? ''} onChange={(_event, data) => onChoose(data.value as MissingTranslationChoice)}>
      {story.choices.map((option) => <Radio key={option} value={option} label={label(option)} />)}
    </RadioGroup>
  );
}

import type { ReactNode } from 'react';
import { Badge, makeStyles, Spinner, Text, tokens } from '@fluentui/react-components';
import type { MyWorkView, Role } from '@mantlepiece/shared';
import type { TFunction } from 'i18next';
import { useTranslation } from 'react-i18next';
import { useMyWork } from '../../api/my-work';
import { DemoBadge } from '../../components/fleet/DemoBadge';
import { durationText, relativeTime } from '../../components/fleet/relative-time';
import { useDateFormat, useDayFormat } from '../../components/formatting';
import { TextLink } from '../../components/links';

const useStyles = makeStyles({
  list: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXS },
  heading: { margin: 0, display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalS },
  items: { listStyle: 'none', margin: 0, padding: 0, display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXS },
  item: { display: 'flex', flexWrap: 'wrap', alignItems: 'baseline', columnGap: tokens.spacingHorizontalS },
  detail: { color: tokens.colorNeutralForeground3, fontSize: tokens.fontSizeBase200 },
  empty: { color: tokens.colorNeutralForeground3, margin: 0 },
  lists: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalL },
});

interface Row {
  key: string | number;
  link: string;
  label: string;
  detail?: ReactNode;
}

/** Every list of waiting work, by its kind, across the roles. */
type Lists = NonNullable<MyWorkView['curator']> & NonNullable<MyWorkView['educator']> & NonNullable<MyWorkView['translator']>
  & NonNullable<MyWorkView['technician']> & NonNullable<MyWorkView['admin']>;
type SectionKind = keyof Lists;
type Section = { [K in SectionKind]: { kind: K; list: Lists[K] } }[SectionKind];

/** What a row's wording needs from the page: the translation, "how long ago", and dates and days as staff read them. */
interface Words {
  t: TFunction;
  ago: (iso: string) => string;
  formatDate: (iso: string) => string;
  formatDay: (day: string) => string;
}

/** How each list reads: where its "all" link leads, and each item as a row. */
const SECTIONS: { [K in SectionKind]: { more: string; toRow: (item: Lists[K]['items'][number], words: Words) => Row } } = {
  drafts: { more: '/stories', toRow: (item, { t, ago }) => ({ key: item.storyId, link: item.link, label: item.title, detail: t('home.work.changed', { when: ago(item.updatedAt) }) }) },
  changesRequested: { more: '/stories', toRow: (item, words) => SECTIONS.drafts.toRow(item, words) },
  openComments: {
    more: '/stories',
    toRow: (item, { t, ago }) => ({ key: item.storyId, link: item.link, label: item.title, detail: t('home.work.comments', { count: item.openComments, when: ago(item.latestAt) }) }),
  },
  reviewQueue: {
    more: '/reviews',
    toRow: (item, { t }) => ({ key: item.revisionId, link: item.link, label: item.title, detail: t('home.work.waiting', { number: item.revisionNumber, time: durationText(item.waitingS) }) }),
  },
  translations: {
    more: '/translations',
    toRow: (item, { t }) => ({ key: `${item.storyId}-${item.locale}`, link: item.link, label: `${item.title} · ${item.locale}`, detail: t('home.work.units', { untranslated: item.untranslated, stale: item.stale }) }),
  },
  kiosks: {
    more: '/fleet',
    toRow: (item, { t, ago }) => ({
      key: item.kioskId, link: item.link, label: `${item.station} · ${item.gallery}`,
      detail: <>{t(`kioskStates.${item.state}`)} · {item.lastHeartbeatAt ? t('home.work.lastHeard', { when: ago(item.lastHeartbeatAt) }) : t('home.work.neverHeard')}{item.demo ? <> <DemoBadge /></> : null}</>,
    }),
  },
  releases: {
    more: '/releases',
    toRow: (item, { t, ago }) => ({ key: item.releaseId, link: item.link, label: t('home.work.release', { number: item.number, gallery: item.gallery }), detail: `${t(`releaseStates.${item.state}`)} · ${ago(item.at)}` }),
  },
  invitations: {
    more: '/people',
    toRow: (item, { t, formatDate }) => ({ key: item.invitationId, link: item.link, label: `${item.name} (${item.email})`, detail: t('home.work.invitationExpires', { date: formatDate(item.expiresAt) }) }),
  },
  licences: {
    more: '/media',
    toRow: (item, { t, formatDay }) => ({ key: item.mediaId, link: item.link, label: item.filename, detail: t(item.daysLeft < 0 ? 'home.work.licenceEnded' : 'home.work.licenceEnds', { date: formatDay(item.expiresOn) }) }),
  },
};

/** One list of waiting work: a heading with its count, each item a link to where it is done, and the way to the rest. */
function WorkSection<K extends SectionKind>({ kind, list, words }: { kind: K; list: Lists[K]; words: Words }) {
  const { t } = words;
  const styles = useStyles();
  const { more, toRow } = SECTIONS[kind];
  const id = `work-${kind}`;
  return (
    <section className={styles.list} aria-labelledby={id} data-work-list={id}>
      <Text as="h3" size={300} weight="semibold" id={id} className={styles.heading}>
        {t(`home.work.${kind}`)}
        <Badge appearance={list.total ? 'filled' : 'tint'} color={list.total ? 'brand' : 'subtle'} data-count={list.total}>{list.total}</Badge>
      </Text>
      {list.items.length === 0 ? (
        <Text as="p" className={styles.empty}>{t('home.work.nothing')}</Text>
      ) : (
        <ul className={styles.items}>
          {list.items.map((item) => {
            const row = toRow(item, words);
            return (
              <li key={row.key} className={styles.item}>
                <TextLink to={row.link}>{row.label}</TextLink>
                {row.detail ? <span className={styles.detail}>{row.detail}</span> : null}
              </li>
            );
          })}
        </ul>
      )}
      {list.total > list.items.length ? <TextLink to={more}>{t('home.work.all', { count: list.total })}</TextLink> : null}
    </section>
  );
}

/** The work waiting for one role, as GET /api/me/work gives it; nothing when the role holds no lists. */
export function MyWorkLists({ role }: { role: Role }) {
  const { t, i18n } = useTranslation();
  const styles = useStyles();
  const work = useMyWork();
  const formatDate = useDateFormat();
  const formatDay = useDayFormat();
  const language = i18n.resolvedLanguage ?? 'en';
  if (work.isPending) return <Spinner size="tiny" label={t('home.work.loading')} />;
  if (work.isError) return <Text as="p" className={styles.empty}>{t('home.work.loadError')}</Text>;
  const now = new Date(work.dataUpdatedAt);
  const words: Words = { t, ago: (iso) => relativeTime(iso, now, language), formatDate, formatDay };
  const sections = sectionsOf(work.data, role);
  if (!sections) return null;
  return (
    <div className={styles.lists}>
      {sections.map((section) => <WorkSection key={section.kind} kind={section.kind} list={section.list} words={words} />)}
    </div>
  );
}

function sectionsOf(work: MyWorkView, role: Role): Section[] | null {
  switch (role) {
    case 'curator':
      return work.curator ? [
        { kind: 'drafts', list: work.curator.drafts },
        { kind: 'changesRequested', list: work.curator.changesRequested },
        { kind: 'openComments', list: work.curator.openComments },
      ] : null;
    case 'educator':
      return work.educator ? [{ kind: 'reviewQueue', list: work.educator.reviewQueue }] : null;
    case 'translator':
      return work.translator ? [{ kind: 'translations', list: work.translator.translations }] : null;
    case 'technician':
      return work.technician ? [{ kind: 'kiosks', list: work.technician.kiosks }, { kind: 'releases', list: work.technician.releases }] : null;
    case 'admin':
      return work.admin ? [{ kind: 'invitations', list: work.admin.invitations }, { kind: 'licences', list: work.admin.licences }] : null;
  }
}

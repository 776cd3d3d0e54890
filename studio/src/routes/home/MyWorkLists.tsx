import type { ReactNode } from 'react';
import { Badge, makeStyles, Spinner, Text, tokens } from '@fluentui/react-components';
import type { MyWorkView, Role, WorkList } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useMyWork } from '../../api/my-work';
import { DemoBadge } from '../../components/fleet/DemoBadge';
import { durationText, relativeTime } from '../../components/fleet/relative-time';
import { useDateFormat } from '../../components/formatting';
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

/** One list of waiting work: a heading with its count, each item a link to where it is done, and the way to the rest. */
function WorkSection<T>({ id, title, list, toRow, more }: { id: string; title: string; list: WorkList<T>; toRow: (item: T) => Row; more: string }) {
  const { t } = useTranslation();
  const styles = useStyles();
  return (
    <section className={styles.list} aria-labelledby={id} data-work-list={id}>
      <Text as="h3" size={300} weight="semibold" id={id} className={styles.heading}>
        {title}
        <Badge appearance={list.total ? 'filled' : 'tint'} color={list.total ? 'brand' : 'subtle'} data-count={list.total}>{list.total}</Badge>
      </Text>
      {list.items.length === 0 ? (
        <Text as="p" className={styles.empty}>{t('home.work.nothing')}</Text>
      ) : (
        <ul className={styles.items}>
          {list.items.map((item) => {
            const row = toRow(item);
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
  const language = i18n.resolvedLanguage ?? 'en';
  if (work.isPending) return <Spinner size="tiny" label={t('home.work.loading')} />;
  if (work.isError) return <Text as="p" className={styles.empty}>{t('home.work.loadError')}</Text>;
  const now = new Date(work.dataUpdatedAt);
  const ago = (iso: string) => relativeTime(iso, now, language);
  const sections = sectionsOf(work.data, role);
  if (!sections) return null;
  return (
    <div className={styles.lists}>
      {sections.map((section) => {
        switch (section.kind) {
          case 'drafts':
          case 'changesRequested':
            return (
              <WorkSection
                key={section.kind}
                id={`work-${section.kind}`}
                title={t(`home.work.${section.kind}`)}
                list={section.list}
                more="/stories"
                toRow={(item) => ({ key: item.storyId, link: item.link, label: item.title, detail: t('home.work.changed', { when: ago(item.updatedAt) }) })}
              />
            );
          case 'openComments':
            return (
              <WorkSection
                key={section.kind}
                id="work-openComments"
                title={t('home.work.openComments')}
                list={section.list}
                more="/stories"
                toRow={(item) => ({ key: item.storyId, link: item.link, label: item.title, detail: t('home.work.comments', { count: item.openComments, when: ago(item.latestAt) }) })}
              />
            );
          case 'reviewQueue':
            return (
              <WorkSection
                key={section.kind}
                id="work-reviewQueue"
                title={t('home.work.reviewQueue')}
                list={section.list}
                more="/reviews"
                toRow={(item) => ({ key: item.revisionId, link: item.link, label: item.title, detail: t('home.work.waiting', { number: item.revisionNumber, time: durationText(item.waitingS) }) })}
              />
            );
          case 'translations':
            return (
              <WorkSection
                key={section.kind}
                id="work-translations"
                title={t('home.work.translations')}
                list={section.list}
                more="/translations"
                toRow={(item) => ({ key: `${item.storyId}-${item.locale}`, link: item.link, label: `${item.title} · ${item.locale}`, detail: t('home.work.units', { untranslated: item.untranslated, stale: item.stale }) })}
              />
            );
          case 'kiosks':
            return (
              <WorkSection
                key={section.kind}
                id="work-kiosks"
                title={t('home.work.kiosks')}
                list={section.list}
                more="/fleet"
                toRow={(item) => ({
                  key: item.kioskId, link: item.link, label: `${item.station} · ${item.gallery}`,
                  detail: <>{t(`kioskStates.${item.state}`)} · {item.lastHeartbeatAt ? t('home.work.lastHeard', { when: ago(item.lastHeartbeatAt) }) : t('home.work.neverHeard')}{item.demo ? <> <DemoBadge /></> : null}</>,
                })}
              />
            );
          case 'releases':
            return (
              <WorkSection
                key={section.kind}
                id="work-releases"
                title={t('home.work.releases')}
                list={section.list}
                more="/releases"
                toRow={(item) => ({ key: item.releaseId, link: item.link, label: t('home.work.release', { number: item.number, gallery: item.gallery }), detail: `${t(`releaseStates.${item.state}`)} · ${ago(item.at)}` })}
              />
            );
          case 'invitations':
            return (
              <WorkSection
                key={section.kind}
                id="work-invitations"
                title={t('home.work.invitations')}
                list={section.list}
                more="/people"
                toRow={(item) => ({ key: item.invitationId, link: item.link, label: `${item.name} (${item.email})`, detail: t('home.work.invitationExpires', { date: formatDate(item.expiresAt) }) })}
              />
            );
          case 'licences':
            return (
              <WorkSection
                key={section.kind}
                id="work-licences"
                title={t('home.work.licences')}
                list={section.list}
                more="/media"
                toRow={(item) => ({ key: item.mediaId, link: item.link, label: item.filename, detail: t(item.daysLeft < 0 ? 'home.work.licenceEnded' : 'home.work.licenceEnds', { date: item.expiresOn }) })}
              />
            );
        }
      })}
    </div>
  );
}

type Section =
  | { kind: 'drafts' | 'changesRequested'; list: NonNullable<MyWorkView['curator']>['drafts'] }
  | { kind: 'openComments'; list: NonNullable<MyWorkView['curator']>['openComments'] }
  | { kind: 'reviewQueue'; list: NonNullable<MyWorkView['educator']>['reviewQueue'] }
  | { kind: 'translations'; list: NonNullable<MyWorkView['translator']>['translations'] }
  | { kind: 'kiosks'; list: NonNullable<MyWorkView['technician']>['kiosks'] }
  | { kind: 'releases'; list: NonNullable<MyWorkView['technician']>['releases'] }
  | { kind: 'invitations'; list: NonNullable<MyWorkView['admin']>['invitations'] }
  | { kind: 'licences'; list: NonNullable<MyWorkView['admin']>['licences'] };

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

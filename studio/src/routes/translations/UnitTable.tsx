import { Badge, makeStyles, mergeClasses, Table, TableBody, TableCell, TableHeader, TableHeaderCell, TableRow, tokens, type BadgeProps } from '@fluentui/react-components';
import { directionOf, type TranslationUnitView, type UnitStatus } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';

const useStyles = makeStyles({
  table: { backgroundColor: tokens.colorNeutralBackground1, border: `1px solid ${tokens.colorNeutralStroke2}`, borderRadius: tokens.borderRadiusLarge },
  row: { cursor: 'pointer' },
  selected: { backgroundColor: tokens.colorBrandBackground2, ':hover': { backgroundColor: tokens.colorBrandBackground2Hover } },
  // Two lines of the source are enough to recognise a unit; the editor shows all of it.
  source: { display: 'block', maxHeight: '2.8em', lineHeight: '1.4em', overflow: 'hidden', overflowWrap: 'anywhere' },
  panel: { width: '3.5rem' },
  kind: { width: '6.5rem' },
  status: { width: '7rem' },
  pick: {
    display: 'block', margin: 0, border: 'none', backgroundColor: 'transparent', color: 'inherit', font: 'inherit', width: '100%', cursor: 'pointer', textAlign: 'start', paddingTop: tokens.spacingVerticalXS, paddingBottom: tokens.spacingVerticalXS,
    ':focus-visible': { outline: `2px solid ${tokens.colorStrokeFocus2}`, outlineOffset: '2px', borderRadius: tokens.borderRadiusSmall },
  },
  muted: { color: tokens.colorNeutralForeground3 },
});

export const STATUS_COLOURS: Record<UnitStatus, BadgeProps['color']> = { untranslated: 'informative', translated: 'success', stale: 'warning' };

export function StatusBadge({ status }: { status: UnitStatus }) {
  const { t } = useTranslation();
  return <Badge appearance="tint" color={STATUS_COLOURS[status]}>{t(`workspace.statuses.${status}`)}</Badge>;
}

/** The units of one page; choosing a row opens it in the editor beside the table. */
export function UnitTable({ units, selectedId, sourceLocale, onSelect, busy }: {
  units: TranslationUnitView[];
  selectedId: string | undefined;
  sourceLocale: string;
  onSelect: (unitId: string) => void;
  busy: boolean;
}) {
  const { t } = useTranslation();
  const styles = useStyles();
  return (
    <Table aria-label={t('workspace.units')} aria-busy={busy} className={styles.table} size="small">
      <TableHeader>
        <TableRow>
          <TableHeaderCell className={styles.panel}>{t('workspace.columns.panel')}</TableHeaderCell>
          <TableHeaderCell className={styles.kind}>{t('workspace.columns.kind')}</TableHeaderCell>
          <TableHeaderCell>{t('workspace.columns.source')}</TableHeaderCell>
          <TableHeaderCell className={styles.status}>{t('workspace.columns.status')}</TableHeaderCell>
        </TableRow>
      </TableHeader>
      <TableBody>
        {units.map((unit) => {
          const selected = unit.unitId === selectedId;
          return (
            <TableRow
              key={unit.unitId}
              className={mergeClasses(styles.row, selected && styles.selected)}
              aria-selected={selected}
              data-unit-row={unit.unitId}
              data-unit-status={unit.status}
              onClick={() => onSelect(unit.unitId)}
            >
              <TableCell>{unit.panelNumber === null ? <span className={styles.muted}>–</span> : unit.panelNumber}</TableCell>
              <TableCell>{t(`workspace.kinds.${unit.kind}`)}</TableCell>
              <TableCell>
                {/* A real button in the row, so a keyboard reaches every unit; the row's click is the pointer's shortcut. */}
                <button type="button" className={styles.pick} aria-current={selected || undefined} onClick={(event) => { event.stopPropagation(); onSelect(unit.unitId); }}>
                  <span className={styles.source} lang={sourceLocale} dir={directionOf(sourceLocale)}>{unit.source}</span>
                </button>
              </TableCell>
              <TableCell><StatusBadge status={unit.status} /></TableCell>
            </TableRow>
          );
        })}
      </TableBody>
    </Table>
  );
}

import type { ReactNode } from 'react';
import { makeStyles, Table, TableBody, TableCell, TableHeader, TableHeaderCell, TableRow, Text, tokens } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import { FigureChart } from './FigureChart';

export interface FigureRow {
  key: string;
  /** What the bar is called on the chart. */
  label: string;
  value: number;
  /** The table's cells, one per column. */
  cells: ReactNode[];
}

const useStyles = makeStyles({
  section: {
    display: 'grid', gridTemplateColumns: 'minmax(0, 3fr) minmax(0, 2fr)', gap: tokens.spacingHorizontalXXL, alignItems: 'start',
    padding: tokens.spacingHorizontalL, marginBottom: tokens.spacingVerticalL,
    backgroundColor: tokens.colorNeutralBackground1, border: `1px solid ${tokens.colorNeutralStroke2}`, borderRadius: tokens.borderRadiusLarge,
    '@media (max-width: 960px)': { gridTemplateColumns: 'minmax(0, 1fr)' },
  },
  heading: { gridColumn: '1 / -1', margin: 0 },
  number: { fontVariantNumeric: 'tabular-nums', textAlign: 'end' },
  muted: { color: tokens.colorNeutralForeground3, margin: 0 },
});

/** One figure: a heading, its chart and the same numbers as a table (the last column is the number). */
export function FigureSection({ title, chartLabel, columns, rows, format = String, decimals = 0 }: {
  title: string;
  chartLabel: string;
  columns: string[];
  rows: FigureRow[];
  format?: (value: number) => string;
  /** Decimals the chart's axis may show: 0 for counts. */
  decimals?: number;
}) {
  const { t } = useTranslation();
  const styles = useStyles();
  const last = columns.length - 1;
  return (
    <section className={styles.section} aria-label={title}>
      <Text as="h2" size={500} weight="semibold" className={styles.heading}>{title}</Text>
      {rows.length === 0 ? (
        <Text as="p" className={styles.muted}>{t('insights.none')}</Text>
      ) : (
        <>
          <FigureChart label={chartLabel} labels={rows.map((row) => row.label)} values={rows.map((row) => row.value)} format={format} decimals={decimals} />
          <Table aria-label={title} size="small">
            <TableHeader>
              <TableRow>
                {columns.map((column, index) => <TableHeaderCell key={column} className={index === last ? styles.number : undefined}>{column}</TableHeaderCell>)}
              </TableRow>
            </TableHeader>
            <TableBody>
              {rows.map((row) => (
                <TableRow key={row.key}>
                  {row.cells.map((cell, index) => <TableCell key={index} className={index === last ? styles.number : undefined}>{cell}</TableCell>)}
                </TableRow>
              ))}
            </TableBody>
          </Table>
        </>
      )}
    </section>
  );
}

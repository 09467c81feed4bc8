import { useMemo, useState } from 'react';
import { createColumnHelper, createSortedRowModel, rowSortingFeature, sortFn_alphanumeric, sortFn_basic, tableFeatures, useTable, type SortingState } from '@tanstack/react-table';
import { formatHoursMinutes, type MarginRow, type MarginsReport } from '@keybed/shared';
import { TextLink } from '@/components/text-link';
import { paths } from '@/config/paths';
import { cx } from '@/lib/cx';
import { formatMinor, formatPercent } from '@/lib/money';

const features = tableFeatures({
  rowSortingFeature,
  sortedRowModel: createSortedRowModel(),
  sortFns: { alphanumeric: sortFn_alphanumeric, basic: sortFn_basic },
});
const helper = createColumnHelper<typeof features, MarginRow>();

/** Money and hours columns: right-aligned, tabular, and their first click sorts the largest first. */
const money = (key: 'priceMinor' | 'costToDateMinor' | 'forecastCostMinor' | 'forecastMarginMinor', header: string) =>
  helper.accessor(key, { header, sortFn: 'basic', sortDescFirst: true, meta: { isNumeric: true } });

function FlagList({ row }: { row: MarginRow }) {
  if (!row.isAtRisk) return <span className="text-graphite-600">—</span>;
  return (
    <span className="flex flex-col gap-0.5 text-xs font-semibold text-damper">
      {row.isBelowTargetMargin && <span>Below target margin</span>}
      {row.isOverEstimate && <span>Over its hours</span>}
    </span>
  );
}

const STATUS = { active: 'Active', on_hold: 'On hold', done: 'Done', cancelled: 'Cancelled', proposed: 'Proposed' } as const;

const th = 'px-3 py-2 font-semibold whitespace-nowrap';
const td = 'px-3 py-2';

/** One row per job (at-risk jobs first until another order is chosen), sortable by any column, with totals. */
export function MarginsTable({ report }: { report: MarginsReport }) {
  const [sorting, setSorting] = useState<SortingState>([]);
  const m = (minor: number) => formatMinor(minor, report.currency);
  const columns = useMemo(
    () =>
      helper.columns([
        helper.accessor('title', {
          header: 'Job',
          sortFn: 'alphanumeric',
          cell: (info) => (
            <>
              <TextLink to={paths.job.build(info.row.original.jobId)}>{info.getValue()}</TextLink>
              <span className="block text-graphite-600">{info.row.original.clientName} · {STATUS[info.row.original.status]}</span>
            </>
          ),
        }),
        helper.accessor('isAtRisk', { header: 'Flags', sortFn: 'basic', sortDescFirst: true, cell: (info) => <FlagList row={info.row.original} /> }),
        { ...money('priceMinor', 'Price'), cell: (info) => m(info.getValue()) },
        { ...money('costToDateMinor', 'Cost to date'), cell: (info) => m(info.getValue()) },
        { ...money('forecastCostMinor', 'Forecast cost'), cell: (info) => m(info.getValue()) },
        { ...money('forecastMarginMinor', 'Forecast margin'), cell: (info) => m(info.getValue()) },
        helper.accessor('forecastMarginPercent', { header: 'Margin %', sortFn: 'basic', sortUndefined: 'last', meta: { isNumeric: true }, cell: (info) => formatPercent(info.getValue()) }),
        helper.accessor('estimatedMinutes', { header: 'Hours estimated', sortFn: 'basic', sortDescFirst: true, meta: { isNumeric: true }, cell: (info) => formatHoursMinutes(info.getValue()) }),
        helper.accessor('actualMinutes', {
          header: 'Hours logged',
          sortFn: 'basic',
          sortDescFirst: true,
          meta: { isNumeric: true },
          cell: (info) => <span className={cx(info.row.original.isOverEstimate && 'font-semibold text-damper')}>{formatHoursMinutes(info.getValue())}</span>,
        }),
      ]),
    [report.currency],
  );
  const table = useTable({ features, columns, data: report.rows, getRowId: (row) => row.jobId, state: { sorting }, onSortingChange: setSorting });
  const totals = report.totals;

  return (
    <div className="overflow-x-auto rounded-lg border border-graphite-300 bg-white">
      <table className="w-full min-w-[72rem] text-sm">
        <caption className="px-3 pt-3 text-left text-sm text-graphite-600">
          {totals.jobCount} {totals.jobCount === 1 ? 'job' : 'jobs'}, {totals.atRiskCount} at risk. Choose a column heading to sort by it.
        </caption>
        <thead className="border-b border-graphite-300 bg-graphite-100">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const sorted = header.column.getIsSorted();
                const isNumeric = (header.column.columnDef.meta as { isNumeric?: boolean } | undefined)?.isNumeric;
                return (
                  <th key={header.id} scope="col" aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : undefined} className={cx(th, isNumeric ? 'text-right' : 'text-left')}>
                    <button type="button" onClick={header.column.getToggleSortingHandler()} className={cx('inline-flex min-h-8 items-center gap-1 hover:underline', isNumeric && 'flex-row-reverse')}>
                      <table.FlexRender header={header} />
                      <span aria-hidden="true" className="w-3 text-graphite-600">{sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : ''}</span>
                    </button>
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className={cx('border-b border-graphite-200 align-top', row.original.isAtRisk && 'bg-damper-light/50')}>
              {row.getAllCells().map((cell) => {
                const isNumeric = (cell.column.columnDef.meta as { isNumeric?: boolean } | undefined)?.isNumeric;
                const Cell = cell.column.id === 'title' ? 'th' : 'td';
                return (
                  <Cell key={cell.id} scope={Cell === 'th' ? 'row' : undefined} className={cx(td, Cell === 'th' && 'min-w-64 text-left font-normal', cell.column.id === 'isAtRisk' && 'min-w-32', isNumeric && 'text-right whitespace-nowrap tabular-figures')}>
                    <table.FlexRender cell={cell} />
                  </Cell>
                );
              })}
            </tr>
          ))}
        </tbody>
        <tfoot className="border-t-2 border-graphite-400 font-bold">
          <tr>
            <th scope="row" className={cx(td, 'text-left')}>Total</th>
            <td className={td}>{totals.atRiskCount > 0 ? `${totals.atRiskCount} at risk` : '—'}</td>
            {[totals.priceMinor, totals.costToDateMinor, totals.forecastCostMinor, totals.forecastMarginMinor].map((value, i) => (
              <td key={i} className={cx(td, 'text-right tabular-figures')}>{m(value)}</td>
            ))}
            <td className={cx(td, 'text-right tabular-figures')}>{formatPercent(totals.forecastMarginPercent)}</td>
            <td className={cx(td, 'text-right tabular-figures')}>{formatHoursMinutes(totals.estimatedMinutes)}</td>
            <td className={cx(td, 'text-right tabular-figures')}>{formatHoursMinutes(totals.actualMinutes)}</td>
          </tr>
        </tfoot>
      </table>
    </div>
  );
}

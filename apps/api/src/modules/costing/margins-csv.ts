import { formatHoursMinutes, minorToDecimalString, type MarginsReport } from '@keybed/shared';
import { toCsv, type CsvValue } from '../../lib/csv';

const percent = (value: number | null) => (value === null ? null : value.toFixed(1));

/** The margins report's rows and totals as CSV: money as exact decimals of the currency, hours as h:mm. */
export function marginsCsv(report: MarginsReport): string {
  const money = (minor: number) => minorToDecimalString(minor, report.currency);
  const header = ['Job', 'Client', 'Status', `Price (${report.currency})`, 'Cost to date', 'Forecast cost', 'Forecast margin', 'Forecast margin %', 'Hours estimated', 'Hours actual', 'At risk'];
  const rows: CsvValue[][] = report.rows.map((r) => [
    r.title,
    r.clientName,
    r.status,
    money(r.priceMinor),
    money(r.costToDateMinor),
    money(r.forecastCostMinor),
    money(r.forecastMarginMinor),
    percent(r.forecastMarginPercent),
    formatHoursMinutes(r.estimatedMinutes),
    formatHoursMinutes(r.actualMinutes),
    r.isAtRisk ? 'yes' : 'no',
  ]);
  const t = report.totals;
  const totals: CsvValue[] = [
    `Total (${t.jobCount} jobs)`,
    '',
    '',
    money(t.priceMinor),
    money(t.costToDateMinor),
    money(t.forecastCostMinor),
    money(t.forecastMarginMinor),
    percent(t.forecastMarginPercent),
    formatHoursMinutes(t.estimatedMinutes),
    formatHoursMinutes(t.actualMinutes),
    `${t.atRiskCount} at risk`,
  ];
  return toCsv([header, ...rows, totals]);
}

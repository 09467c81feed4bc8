import { Bar, BarChart, CartesianGrid, Cell, Legend, ReferenceLine, ResponsiveContainer, XAxis, YAxis } from 'recharts';
import { formatHoursMinutes, type MarginsReport } from '@keybed/shared';
import { formatBasisPoints, formatPercent } from '@/lib/money';
import { usePrefersReducedMotion } from '../hooks/use-prefers-reduced-motion';

/** Colours of the design tokens, for SVG fills (see app.css). */
const COLOURS = { felt: '#2f5d50', damper: '#a23b2a', walnut: '#6b4226', spruce: '#c9a66b', graphite: '#5c554c', grid: '#e6e1d9' } as const;
const tick = { fill: COLOURS.graphite, fontSize: 12 };
const shorten = (title: string) => (title.length > 28 ? `${title.slice(0, 27)}…` : title);
const heightFor = (rows: number) => Math.max(140, rows * 40 + 60);

interface ChartFrameProps {
  title: string;
  summary: string;
  children: React.ReactNode;
}

/** A chart with its caption; the figures are in the table below, which is the text alternative. */
function ChartFrame({ title, summary, children }: ChartFrameProps) {
  return (
    <figure className="space-y-2 rounded-lg border border-graphite-300 bg-white p-4">
      <figcaption>
        <span className="block font-semibold">{title}</span>
        <span className="block text-sm text-graphite-600">{summary} The table below lists every figure.</span>
      </figcaption>
      <div aria-hidden="true">{children}</div>
    </figure>
  );
}

/** Forecast margin % per job against the target margin line; jobs below it in damper. */
export function MarginChart({ report }: { report: MarginsReport }) {
  const isReduced = usePrefersReducedMotion();
  const rows = report.rows.filter((r) => r.forecastMarginPercent !== null).map((r) => ({ id: r.jobId, name: shorten(r.title), percent: Math.round(r.forecastMarginPercent! * 10) / 10, isBelow: r.isBelowTargetMargin }));
  const target = report.targetMarginBasisPoints / 100;
  const below = rows.filter((r) => r.isBelow).length;
  const summary =
    rows.length === 0
      ? 'No job has an agreed price yet, so there is no margin to chart.'
      : `${rows.length} priced ${rows.length === 1 ? 'job' : 'jobs'}; ${below} below the target of ${formatBasisPoints(report.targetMarginBasisPoints)}.`;
  return (
    <ChartFrame title="Forecast margin by job" summary={summary}>
      {rows.length > 0 && (
        <ResponsiveContainer width="100%" height={heightFor(rows.length)}>
          <BarChart data={rows} layout="vertical" margin={{ top: 24, left: 8, right: 40 }} accessibilityLayer={false}>
            <CartesianGrid horizontal={false} stroke={COLOURS.grid} />
            <XAxis type="number" unit=" %" tick={tick} domain={[(min: number) => Math.min(0, Math.floor(min / 10) * 10), (max: number) => Math.max(target + 10, Math.ceil(max / 10) * 10)]} />
            <YAxis type="category" dataKey="name" width={190} tick={tick} />
            <Bar dataKey="percent" name="Forecast margin %" isAnimationActive={!isReduced} label={{ position: 'right', fill: COLOURS.graphite, fontSize: 12, formatter: (v: unknown) => `${v} %` }}>
              {rows.map((r) => (
                <Cell key={r.id} fill={r.isBelow ? COLOURS.damper : COLOURS.felt} />
              ))}
            </Bar>
            <ReferenceLine x={target} stroke={COLOURS.walnut} strokeDasharray="4 3" label={{ value: `Target ${formatPercent(target)}`, position: 'top', fill: COLOURS.walnut, fontSize: 12 }} />
          </BarChart>
        </ResponsiveContainer>
      )}
    </ChartFrame>
  );
}

/** Hours estimated beside hours logged, per job. */
export function HoursChart({ report }: { report: MarginsReport }) {
  const isReduced = usePrefersReducedMotion();
  const rows = report.rows
    .filter((r) => r.estimatedMinutes > 0 || r.actualMinutes > 0)
    .map((r) => ({ name: shorten(r.title), estimated: r.estimatedMinutes / 60, logged: r.actualMinutes / 60 }));
  const over = report.rows.filter((r) => r.isOverEstimate).length;
  const summary =
    rows.length === 0
      ? 'No hours estimated or logged in this period.'
      : `${formatHoursMinutes(report.totals.actualMinutes)} logged against ${formatHoursMinutes(report.totals.estimatedMinutes)} estimated; ${over} ${over === 1 ? 'job' : 'jobs'} over their hours.`;
  return (
    <ChartFrame title="Hours estimated and logged by job" summary={summary}>
      {rows.length > 0 && (
        <ResponsiveContainer width="100%" height={heightFor(rows.length) + 20}>
          <BarChart data={rows} layout="vertical" margin={{ left: 8, right: 24 }} accessibilityLayer={false}>
            <CartesianGrid horizontal={false} stroke={COLOURS.grid} />
            <XAxis type="number" unit=" h" tick={tick} />
            <YAxis type="category" dataKey="name" width={190} tick={tick} />
            <Legend wrapperStyle={{ fontSize: 12 }} />
            <Bar dataKey="estimated" name="Estimated" fill={COLOURS.spruce} isAnimationActive={!isReduced} />
            <Bar dataKey="logged" name="Logged" fill={COLOURS.walnut} isAnimationActive={!isReduced} />
          </BarChart>
        </ResponsiveContainer>
      )}
    </ChartFrame>
  );
}

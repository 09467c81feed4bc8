import type { ReactNode } from 'react';
import { formatHoursMinutes, type JobCosting } from '@keybed/shared';
import { Alert } from '@/components/alert';
import { cx } from '@/lib/cx';
import { formatBasisPoints, formatMinor, formatPercent } from '@/lib/money';
import { HoursMeter } from './hours-meter';

function Row({ label, children, isStrong = false, isBad = false }: { label: string; children: ReactNode; isStrong?: boolean; isBad?: boolean }) {
  return (
    <div className={cx('contents', isStrong && 'font-bold')}>
      <dt className={isStrong ? 'border-t border-graphite-300 pt-1' : undefined}>{label}</dt>
      <dd className={cx('text-right tabular-figures', isStrong && 'border-t border-graphite-300 pt-1', isBad && 'text-damper')}>{children}</dd>
    </div>
  );
}

const panel = 'space-y-2 rounded-lg border border-graphite-300 bg-white p-4';

/** Hours against the budget for everyone; cost to date, forecast, margin and money received for the owner. */
export function CostingSummary({ costing }: { costing: JobCosting }) {
  const { hours, money, currency } = costing;
  const m = (minor: number) => formatMinor(minor, currency);
  return (
    <div className="grid gap-4 md:grid-cols-2">
      <section aria-label="Hours" className={panel}>
        <h3 className="font-semibold">Hours</h3>
        <HoursMeter estimatedMinutes={hours.estimatedMinutes} actualMinutes={hours.actualMinutes} />
        <dl className="grid grid-cols-[1fr_auto] gap-x-4 gap-y-1 text-sm">
          <Row label="Estimated">{formatHoursMinutes(hours.estimatedMinutes)}</Row>
          <Row label="Logged">{formatHoursMinutes(hours.actualMinutes)}</Row>
          <Row label="Budget left on open tasks">{formatHoursMinutes(hours.remainingMinutes)}</Row>
          {hours.isOverEstimate && <Row label="Over the estimate" isBad>{formatHoursMinutes(hours.minutesOverEstimate)}</Row>}
        </dl>
      </section>
      {money && (
        <>
          <section aria-label="Cost to date" className={panel}>
            <h3 className="font-semibold">Cost to date</h3>
            <dl className="grid grid-cols-[1fr_auto] gap-x-4 gap-y-1 text-sm">
              <Row label="Labour">{m(money.labourCostMinor)}</Row>
              <Row label="Parts">{m(money.partsCostMinor)}</Row>
              <Row label="Sublet bills">{m(money.subletCostMinor)}</Row>
              <Row label="Cost to date" isStrong>{m(money.costToDateMinor)}</Row>
            </dl>
          </section>
          <section aria-label="Forecast at completion" className={cx(panel, 'md:col-span-2')}>
            <h3 className="font-semibold">Forecast at completion</h3>
            <dl className="grid grid-cols-[1fr_auto] gap-x-4 gap-y-1 text-sm md:max-w-md">
              <Row label="Agreed price ex VAT">{m(money.priceMinor)}</Row>
              <Row label={`Hours left at ${m(money.averageCostRateMinorPerHour)} an hour`}>{m(money.remainingLabourMinor)}</Row>
              <Row label="Budgeted parts not yet used">{m(money.unusedBudgetedPartsMinor)}</Row>
              <Row label="Sublet not yet billed">{m(money.unbilledSubletMinor)}</Row>
              <Row label="Forecast cost">{m(money.forecastCostMinor)}</Row>
              <Row label="Forecast margin" isStrong isBad={money.isBelowTargetMargin}>
                {m(money.forecastMarginMinor)} · {formatPercent(money.forecastMarginPercent)}
              </Row>
            </dl>
            {money.priceMinor === 0 ? (
              <p className="text-sm font-semibold text-damper">No agreed price yet: every cost here is unpaid until the client accepts an estimate.</p>
            ) : (
              <p className={cx('text-sm', money.isBelowTargetMargin ? 'font-semibold text-damper' : 'text-graphite-600')}>
                {money.isBelowTargetMargin ? 'Below' : 'At or above'} the target margin of {formatBasisPoints(money.targetMarginBasisPoints)}.
              </p>
            )}
          </section>
          <section aria-label="Money received" className={panel}>
            <h3 className="font-semibold">Money received</h3>
            <dl className="grid grid-cols-[1fr_auto] gap-x-4 gap-y-1 text-sm">
              <Row label="Paid by the client, with VAT">{m(money.receivedMinor)}</Row>
            </dl>
            <p className="text-sm text-graphite-600">Deposits paid by card. Money in, so it leaves the costs and margin above alone.</p>
          </section>
        </>
      )}
      {money && money.unratedMinutes > 0 && (
        <Alert className="md:col-span-2" title="Some hours have no cost rate.">
          <p>{formatHoursMinutes(money.unratedMinutes)} were logged by someone with no cost rate on that day, so they cost nothing here. Add the rate in Settings.</p>
        </Alert>
      )}
    </div>
  );
}

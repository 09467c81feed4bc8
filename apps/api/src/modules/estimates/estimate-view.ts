import { defaultOptionIds, estimateTotals, linesInScope, type Estimate, type EstimateLine, type JobEstimates, type Role } from '@keybed/shared';
import { seesCosts, seesPrices } from '../../http/money-access';
import type { EstimateRow, LineRow, OptionRow } from './estimates.repo';

interface Money {
  currency: string;
  taxRateBasisPoints: number;
}


/** The options in scope: those chosen once accepted, else the first of each choice. */
export const scopeOf = (row: Pick<EstimateRow, 'status'>, options: OptionRow[]) =>
  row.status === 'accepted' ? options.filter((o) => o.isChosen).map((o) => o.id) : defaultOptionIds(options);

function toLine(role: Role, l: LineRow, keyOf: Map<string, string>): EstimateLine {
  return {
    id: l.id,
    position: l.position,
    kind: l.kind,
    description: l.description,
    task: l.taskId ? { id: l.taskId, title: l.taskTitle ?? '' } : null,
    part: l.part?.id ? l.part : null,
    minutes: l.minutes,
    quantityMilli: l.quantityMilli,
    optionId: l.optionId,
    optionKey: l.optionId ? (keyOf.get(l.optionId) ?? null) : null,
    ...(seesPrices(role) ? { unitPriceMinor: l.unitPriceMinor, amountMinor: l.amountMinor } : {}),
    ...(seesCosts(role) ? { unitCostMinor: l.unitCostMinor, costMinor: l.costMinor } : {}),
  };
}

/** One estimate as the role may see it; totals by the shared estimate functions. */
export function toEstimate(role: Role, row: EstimateRow, allOptions: OptionRow[], allLines: LineRow[], money: Money): Estimate {
  const options = allOptions.filter((o) => o.estimateId === row.id);
  const lines = allLines.filter((l) => l.estimateId === row.id);
  const keyOf = new Map(options.map((o) => [o.id, o.key]));
  const scope = scopeOf(row, options);
  const sumOf = (ls: LineRow[]) => ls.reduce((sum, l) => sum + l.amountMinor, 0);
  const labourMinutes = linesInScope(lines, scope).reduce((sum, l) => sum + (l.kind === 'labour' ? (l.minutes ?? 0) : 0), 0);
  return {
    id: row.id,
    jobId: row.jobId,
    revision: row.revision,
    kind: row.kind,
    status: row.status,
    title: row.title,
    notes: row.notes,
    version: row.version,
    currency: money.currency,
    labourMinutes,
    options: options.map((o) => ({
      id: o.id,
      key: o.key,
      choice: o.choice,
      name: o.name,
      isChosen: o.isChosen,
      ...(seesPrices(role) ? { netMinor: sumOf(lines.filter((l) => l.optionId === o.id)) } : {}),
    })),
    lines: lines.map((l) => toLine(role, l, keyOf)),
    ...(seesPrices(role)
      ? {
          baseNetMinor: sumOf(lines.filter((l) => l.optionId === null)),
          totals: estimateTotals(lines, scope, money.taxRateBasisPoints),
          taxRateBasisPoints: money.taxRateBasisPoints,
        }
      : {}),
    issuedAt: row.issuedAt?.toISOString() ?? null,
    acceptedAt: row.acceptedAt?.toISOString() ?? null,
    declinedAt: row.declinedAt?.toISOString() ?? null,
    createdBy: row.createdBy?.id ? row.createdBy : null,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

/** A job's estimates and what has been agreed (accepted original plus accepted variations). */
export function toJobEstimates(role: Role, rows: EstimateRow[], options: OptionRow[], lines: LineRow[], money: Money): JobEstimates {
  const list = rows.map((row) => toEstimate(role, row, options, lines, money));
  const accepted = rows.filter((r) => r.status === 'accepted');
  return {
    estimates: list,
    agreed: {
      estimateIds: accepted.map((r) => r.id),
      labourMinutes: list.filter((e) => e.status === 'accepted').reduce((sum, e) => sum + e.labourMinutes, 0),
      ...(seesPrices(role) ? { netMinor: accepted.reduce((sum, r) => sum + (r.acceptedNetMinor ?? 0), 0) } : {}),
    },
  };
}

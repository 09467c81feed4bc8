import {
  estimateLineAmountMinor,
  type CatalogueLine,
  type CatalogueLineInput,
  type CatalogueOperation,
  type CreateCatalogueOperationInput,
  type Role,
  type UpdateCatalogueOperationInput,
} from '@keybed/shared';
import type { AuthContext } from '../../http/context';
import { AppError, notFound } from '../../http/errors';
import { seesCosts, seesPrices } from '../../http/money-access';
import type { Tx } from '../auth/auth.repo';
import { sellPriceOf } from '../parts/part-view';
import type { SettingsService } from '../settings/settings.service';
import type { CatalogueLineRow, CatalogueLineValues, CatalogueRepo, OperationRow } from './catalogue.repo';

interface Deps {
  repo: CatalogueRepo;
  settings: SettingsService;
  now: () => Date;
}

/** A catalogue line's price per unit: the charge-out rate per hour, the part's sell price, or the sublet price. */
export function unitPriceOf(row: CatalogueLineRow, labourRateMinorPerHour: number) {
  const { line, part } = row;
  if (line.kind === 'labour') return labourRateMinorPerHour;
  if (line.kind === 'part' && part) return sellPriceOf(part);
  return line.unitPriceMinor ?? 0;
}

function toLine(role: Role, row: CatalogueLineRow, labourRate: number): CatalogueLine {
  const { line, part } = row;
  const unitPriceMinor = unitPriceOf(row, labourRate);
  const amountMinor = estimateLineAmountMinor({ kind: line.kind, minutes: line.minutes, quantityMilli: line.quantityMilli, unitPriceMinor, unitCostMinor: null, optionId: null });
  return {
    kind: line.kind,
    description: line.description,
    minutes: line.minutes,
    part: part ? { id: part.id, sku: part.sku, name: part.name, unit: part.unit } : null,
    quantityMilli: line.quantityMilli,
    supplier: line.supplier,
    ...(seesPrices(role) ? { amountMinor, unitPriceMinor } : {}),
    ...(seesCosts(role) ? { unitCostMinor: line.kind === 'part' ? (part?.unitCostMinor ?? null) : line.unitCostMinor } : {}),
  };
}

export function toOperation(role: Role, op: OperationRow, rows: CatalogueLineRow[], labourRate: number): CatalogueOperation {
  const lines = rows.filter((r) => r.line.operationId === op.id).map((r) => toLine(role, r, labourRate));
  return {
    id: op.id,
    name: op.name,
    description: op.description,
    pianoType: op.pianoType,
    componentKeys: op.componentKeys,
    isActive: op.isActive,
    lines,
    labourMinutes: lines.reduce((sum, l) => sum + (l.minutes ?? 0), 0),
    ...(seesPrices(role) ? { netMinor: lines.reduce((sum, l) => sum + (l.amountMinor ?? 0), 0) } : {}),
    version: op.version,
    updatedAt: op.updatedAt.toISOString(),
  };
}

const lineValues = (l: CatalogueLineInput): CatalogueLineValues => {
  if (l.kind === 'labour') return { kind: 'labour', description: l.description, minutes: l.minutes };
  if (l.kind === 'part') return { kind: 'part', description: l.description || 'Part', partId: l.partId, quantityMilli: l.quantityMilli };
  return { kind: 'sublet', description: l.description, supplier: l.supplier, quantityMilli: l.quantityMilli, unitPriceMinor: l.unitPriceMinor, unitCostMinor: l.unitCostMinor ?? null };
};

/** The work catalogue: standard operations and their default lines. */
export function createCatalogueService({ repo, settings, now }: Deps) {
  async function checkParts(tx: Tx, workshopId: string, lines: CatalogueLineInput[]) {
    const ids = lines.flatMap((l) => (l.kind === 'part' ? [l.partId] : []));
    const known = await repo.partIdsOf(workshopId, ids, tx);
    lines.forEach((l, i) => {
      if (l.kind === 'part' && !known.has(l.partId)) throw new AppError('validation_failed', 400, 'There is no such part', { [`lines.${i}.partId`]: ['There is no such part'] });
    });
  }

  async function views(role: Role, workshopId: string, ops: OperationRow[]) {
    const [rows, money] = await Promise.all([repo.linesOf(ops.map((o) => o.id)), settings.get(workshopId)]);
    return ops.map((op) => toOperation(role, op, rows, money.labourRateMinorPerHour));
  }

  async function one(auth: AuthContext, id: string) {
    const [op] = await repo.list(auth.workshopId, { includeInactive: true, ids: [id] });
    if (!op) throw notFound('That catalogue operation');
    return (await views(auth.role, auth.workshopId, [op]))[0]!;
  }

  return {
    views,

    async list(auth: AuthContext, filter: { pianoType?: 'grand' | 'upright'; includeInactive?: boolean }) {
      return { operations: await views(auth.role, auth.workshopId, await repo.list(auth.workshopId, filter)) };
    },

    async create(auth: AuthContext, input: CreateCatalogueOperationInput): Promise<CatalogueOperation> {
      const id = await repo.transaction(async (tx) => {
        await checkParts(tx, auth.workshopId, input.lines);
        const at = now();
        const { lines, ...fields } = input;
        const opId = await repo.insert(tx, { ...fields, workshopId: auth.workshopId, createdAt: at, updatedAt: at });
        await repo.replaceLines(tx, auth.workshopId, opId, lines.map(lineValues));
        return opId;
      });
      return one(auth, id);
    },

    async update(auth: AuthContext, id: string, input: UpdateCatalogueOperationInput): Promise<CatalogueOperation> {
      await repo.transaction(async (tx) => {
        const op = await repo.lock(tx, auth.workshopId, id);
        if (!op) throw notFound('That catalogue operation');
        if (op.version !== input.version) {
          throw new AppError('version_conflict', 409, 'Someone changed this operation since you loaded it. Check it and try again.', undefined, { current: await one(auth, id) });
        }
        const { version: _version, lines, ...fields } = input;
        if (lines) {
          await checkParts(tx, auth.workshopId, lines);
          await repo.replaceLines(tx, auth.workshopId, id, lines.map(lineValues));
        }
        await repo.update(tx, id, fields, now());
      });
      return one(auth, id);
    },
  };
}

export type CatalogueService = ReturnType<typeof createCatalogueService>;

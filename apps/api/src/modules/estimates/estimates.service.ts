import crypto from 'node:crypto';
import {
  estimateLineAmountMinor,
  estimateLineCostMinor,
  estimateTotals,
  linesInScope,
  optionChoiceProblems,
  type AcceptEstimateInput,
  type CreateEstimateInput,
  type Estimate,
  type EstimateLineInput,
  type EstimateOptionInput,
  type JobEstimates,
  type UpdateEstimateInput,
} from '@keybed/shared';
import type { AuthContext } from '../../http/context';
import { AppError, notFound } from '../../http/errors';
import { notifyLive, type Changed } from '../../lib/live-events';
import { constraintOf, isUniqueViolation } from '../../lib/pg-errors';
import type { Tx } from '../auth/auth.repo';
import { sellPriceOf } from '../parts/part-view';
import type { SettingsService } from '../settings/settings.service';
import { toEstimate, toJobEstimates } from './estimate-view';
import type { EstimatesRepo, LineRow, OptionRow } from './estimates.repo';

interface Deps {
  repo: EstimatesRepo;
  settings: SettingsService;
  now: () => Date;
  changed?: Changed;
}

/** A line with every default filled in, ready to be priced and stored. */
interface LineDraft {
  id: string;
  kind: EstimateLineInput['kind'];
  description: string;
  taskId: string | null;
  partId: string | null;
  optionKey: string | null;
  minutes: number | null;
  quantityMilli: number | null;
  unitPriceMinor: number;
  unitCostMinor: number | null;
}

const statusError = (message: string) => new AppError('estimate_status', 409, message);
const fieldError = (field: string, message: string) => new AppError('validation_failed', 400, message, { [field]: [message] });

/** Stored options and lines as drafts, so an estimate can be copied or partly edited. */
function draftsOf(options: OptionRow[], lines: LineRow[], keepIds: boolean) {
  const keyOf = new Map(options.map((o) => [o.id, o.key]));
  return {
    options: options.map((o): EstimateOptionInput => ({ key: o.key, choice: o.choice, name: o.name })),
    lines: lines.map(
      (l): LineDraft => ({
        id: keepIds ? l.id : crypto.randomUUID(),
        kind: l.kind,
        description: l.description,
        taskId: l.taskId,
        partId: l.partId,
        optionKey: l.optionId ? (keyOf.get(l.optionId) ?? null) : null,
        minutes: l.minutes,
        quantityMilli: l.quantityMilli,
        unitPriceMinor: l.unitPriceMinor,
        unitCostMinor: l.unitCostMinor,
      }),
    ),
  };
}

/**
 * Estimates: drafted, issued (frozen), then accepted or declined. The accepted original and
 * accepted variations are the job's budget: accepting sets the linked tasks' estimated minutes
 * (creating a task for a labour line without one) and fixes the agreed price.
 */
export function createEstimatesService({ repo, settings, now, changed = () => {} }: Deps) {
  async function view(auth: AuthContext, id: string, q?: Tx): Promise<Estimate> {
    const [{ rows, options, lines }, money] = await Promise.all([repo.load(auth.workshopId, { id }, q), settings.get(auth.workshopId)]);
    if (!rows[0]) throw notFound('That estimate');
    return toEstimate(auth.role, rows[0], options, lines, money);
  }

  /** Fills defaults (charge-out rate, catalogue prices and costs, kept hidden costs) and checks parts and tasks. */
  async function resolveLines(tx: Tx, auth: AuthContext, jobId: string, inputs: EstimateLineInput[], existing: LineRow[]): Promise<LineDraft[]> {
    const { labourRateMinorPerHour } = await settings.get(auth.workshopId);
    const before = new Map(existing.map((l) => [l.id, l]));
    const partIds = [...new Set(inputs.flatMap((l) => (l.kind === 'part' ? [l.partId] : [])))];
    const catalogue = new Map((await repo.partsByIds(auth.workshopId, partIds, tx)).map((p) => [p.id, p]));
    const taskIds = inputs.flatMap((l) => (l.kind === 'labour' && l.taskId ? [l.taskId] : []));
    const jobTasks = await repo.taskIdsOfJob(tx, jobId, taskIds);
    return inputs.map((input, i): LineDraft => {
      const old = input.id ? before.get(input.id) : undefined;
      if (input.id && !old) throw fieldError(`lines.${i}.id`, 'That line is not on this estimate');
      const same = old && old.kind === input.kind ? old : undefined;
      const base = { id: input.id ?? crypto.randomUUID(), kind: input.kind, optionKey: input.optionKey ?? null, taskId: null, partId: null, minutes: null, quantityMilli: null };
      if (input.kind === 'labour') {
        if (input.taskId && !jobTasks.has(input.taskId)) throw fieldError(`lines.${i}.taskId`, 'Choose a task of this job');
        const unitPriceMinor = input.unitPriceMinor ?? same?.unitPriceMinor ?? labourRateMinorPerHour;
        return { ...base, description: input.description, taskId: input.taskId ?? null, minutes: input.minutes, unitPriceMinor, unitCostMinor: null };
      }
      if (input.kind === 'part') {
        const part = catalogue.get(input.partId);
        if (!part) throw fieldError(`lines.${i}.partId`, 'There is no such part');
        const samePart = same?.partId === input.partId ? same : undefined;
        return {
          ...base,
          description: input.description || part.name,
          partId: part.id,
          quantityMilli: input.quantityMilli,
          unitPriceMinor: input.unitPriceMinor ?? samePart?.unitPriceMinor ?? sellPriceOf(part),
          unitCostMinor: input.unitCostMinor ?? samePart?.unitCostMinor ?? part.unitCostMinor,
        };
      }
      return { ...base, description: input.description, quantityMilli: input.quantityMilli, unitPriceMinor: input.unitPriceMinor, unitCostMinor: input.unitCostMinor ?? same?.unitCostMinor ?? null };
    });
  }

  /** Writes the options (keeping an option's id while its key stays) and the priced lines. */
  async function writeContent(tx: Tx, auth: AuthContext, estimateId: string, jobId: string, options: EstimateOptionInput[], lines: LineDraft[], oldOptions: OptionRow[]) {
    const oldIdOf = new Map(oldOptions.map((o) => [o.key, o.id]));
    const optionRows = options.map((o, position) => ({ id: oldIdOf.get(o.key) ?? crypto.randomUUID(), workshopId: auth.workshopId, estimateId, key: o.key, choice: o.choice, name: o.name, position }));
    const idOf = new Map(optionRows.map((o) => [o.key, o.id]));
    const lineRows = lines.map((l, position) => {
      if (l.optionKey && !idOf.has(l.optionKey)) throw fieldError(`lines.${position}.optionKey`, 'No option has this key');
      const optionId = l.optionKey ? idOf.get(l.optionKey)! : null;
      const priced = { ...l, optionId };
      return {
        id: l.id,
        workshopId: auth.workshopId,
        estimateId,
        jobId,
        position,
        kind: l.kind,
        description: l.description,
        taskId: l.taskId,
        partId: l.partId,
        optionId,
        minutes: l.minutes,
        quantityMilli: l.quantityMilli,
        unitPriceMinor: l.unitPriceMinor,
        unitCostMinor: l.unitCostMinor,
        amountMinor: estimateLineAmountMinor(priced),
        costMinor: estimateLineCostMinor(priced),
      };
    });
    await repo.replaceContent(tx, estimateId, optionRows, lineRows);
  }

  /** Locks the estimate's job, then the estimate. */
  async function lockBoth(tx: Tx, auth: AuthContext, id: string) {
    const peeked = await repo.peekJob(auth.workshopId, id);
    if (!peeked) throw notFound('That estimate');
    await repo.lockJob(tx, auth.workshopId, peeked.jobId);
    const estimate = await repo.lock(tx, auth.workshopId, id);
    if (!estimate) throw notFound('That estimate');
    return estimate;
  }

  /**
   * For accepting: locks the board's first active stage when the job waits for the client (the
   * acceptance will put it there; stage before job is the board's lock order), then the job and
   * the estimate. Answers the stage to place the job in, if it is still proposed once locked.
   */
  async function lockForAcceptance(tx: Tx, auth: AuthContext, id: string) {
    const peeked = await repo.peekJob(auth.workshopId, id);
    if (!peeked) throw notFound('That estimate');
    const stage = peeked.jobStatus === 'proposed' ? await repo.lockFirstActiveStage(tx, auth.workshopId) : undefined;
    const job = await repo.lockJob(tx, auth.workshopId, peeked.jobId);
    const estimate = await repo.lock(tx, auth.workshopId, id);
    if (!job || !estimate) throw notFound('That estimate');
    return { estimate, isProposed: job.status === 'proposed', stage };
  }

  async function write<T>(workshopId: string, fn: (tx: Tx) => Promise<T>): Promise<T> {
    const result = await repo.transaction(fn);
    changed(workshopId);
    return result;
  }

  return {
    async list(auth: AuthContext, jobId: string): Promise<JobEstimates> {
      if (!(await repo.jobExists(auth.workshopId, jobId))) throw notFound('That job');
      const [{ rows, options, lines }, money] = await Promise.all([repo.load(auth.workshopId, { jobId }), settings.get(auth.workshopId)]);
      return toJobEstimates(auth.role, rows, options, lines, money);
    },

    get: (auth: AuthContext, id: string) => view(auth, id),

    /** A draft: an original until one is accepted, then a variation. */
    create: (auth: AuthContext, jobId: string, input: CreateEstimateInput): Promise<Estimate> =>
      write(auth.workshopId, async (tx) => {
        const job = await repo.lockJob(tx, auth.workshopId, jobId);
        if (!job) throw notFound('That job');
        if (job.status === 'cancelled') throw statusError('This job was cancelled; it takes no new estimates');
        const hasAccepted = await repo.hasAcceptedOriginal(tx, jobId);
        const kind = input.kind ?? (hasAccepted ? 'variation' : 'original');
        if (kind === 'original' && hasAccepted) throw statusError('This job already has an accepted estimate. Add the extra work as a variation.');
        if (kind === 'variation' && !hasAccepted) throw statusError('A variation needs an accepted estimate first');
        let content: { options: EstimateOptionInput[]; lines: LineDraft[] } = { options: input.options ?? [], lines: [] };
        if (input.copyFromId) {
          const source = await repo.load(auth.workshopId, { id: input.copyFromId }, tx);
          if (source.rows[0]?.jobId !== jobId) throw fieldError('copyFromId', 'Copy an estimate of this job');
          content = draftsOf(source.options, source.lines, false);
        } else {
          content.lines = await resolveLines(tx, auth, jobId, input.lines ?? [], []);
        }
        const at = now();
        const id = await repo.insert(tx, {
          workshopId: auth.workshopId,
          jobId,
          revision: await repo.nextRevision(tx, jobId),
          kind,
          title: input.title,
          notes: input.notes,
          createdBy: auth.userId,
          createdAt: at,
          updatedAt: at,
        });
        await writeContent(tx, auth, id, jobId, content.options, content.lines, []);
        await notifyLive(tx, auth.workshopId, 'estimate.changed', jobId, at);
        return view(auth, id, tx);
      }),

    /** Edits a draft; `options` and `lines` each replace their whole list. */
    update: (auth: AuthContext, id: string, input: UpdateEstimateInput): Promise<Estimate> =>
      write(auth.workshopId, async (tx) => {
        const estimate = await lockBoth(tx, auth, id);
        if (estimate.version !== input.version) {
          throw new AppError('version_conflict', 409, 'Someone changed this estimate since you loaded it. Check it and try again.', undefined, { current: await view(auth, id, tx) });
        }
        if (estimate.status !== 'draft') throw statusError('Only a draft can be changed. Start a new revision from it instead.');
        const at = now();
        if (input.options || input.lines) {
          const stored = await repo.load(auth.workshopId, { id }, tx);
          const kept = draftsOf(stored.options, stored.lines, true);
          const lines = input.lines ? await resolveLines(tx, auth, estimate.jobId, input.lines, stored.lines) : kept.lines;
          await writeContent(tx, auth, id, estimate.jobId, input.options ?? kept.options, lines, stored.options);
        }
        await repo.bump(tx, id, { title: input.title, notes: input.notes }, at);
        await notifyLive(tx, auth.workshopId, 'estimate.changed', estimate.jobId, at);
        return view(auth, id, tx);
      }),

    /** Freezes a draft for the client. Issuing an original supersedes the job's other issued originals. */
    issue: (auth: AuthContext, id: string): Promise<Estimate> =>
      write(auth.workshopId, async (tx) => {
        const estimate = await lockBoth(tx, auth, id);
        if (estimate.status !== 'draft') throw statusError('Only a draft can be issued');
        const { lines } = await repo.load(auth.workshopId, { id }, tx);
        if (lines.length === 0) throw statusError('Add at least one line before issuing');
        const at = now();
        if (estimate.kind === 'original') await repo.supersedeOtherOriginals(tx, estimate.jobId, id, ['issued'], at);
        await repo.bump(tx, id, { status: 'issued', issuedAt: at }, at);
        await notifyLive(tx, auth.workshopId, 'estimate.changed', estimate.jobId, at);
        return view(auth, id, tx);
      }),

    /**
     * Records the client's acceptance with exactly one option per choice. The agreed price is the
     * in-scope net; the job's labour budget is recomputed from every accepted estimate. Accepting
     * the original of a job waiting for the client (proposed) puts it on the board at the end of
     * the first active stage, in the same transaction: the one path for the owner's acceptance in
     * the app and the client's through their link (`byClient`: the stage event names no member).
     */
    accept: (auth: AuthContext, id: string, input: AcceptEstimateInput, { byClient = false }: { byClient?: boolean } = {}): Promise<Estimate> =>
      write(auth.workshopId, async (tx) => {
        const { estimate, isProposed, stage } = await lockForAcceptance(tx, auth, id);
        if (estimate.status !== 'issued') throw statusError('Only an issued estimate can be accepted');
        const { options, lines } = await repo.load(auth.workshopId, { id }, tx);
        const problems = optionChoiceProblems(options, input.optionIds);
        if (problems.length > 0) throw new AppError('validation_failed', 400, problems[0]!, { optionIds: problems });
        if (estimate.kind === 'original' && (await repo.hasAcceptedOriginal(tx, estimate.jobId))) throw statusError('This job already has an accepted estimate');
        const isPlacing = isProposed && estimate.kind === 'original';
        if (isPlacing && !stage) throw new AppError('conflict', 409, 'The board has no active stage for this job to join. Restore or add a stage, then accept again.');
        const { taxRateBasisPoints } = await settings.get(auth.workshopId);
        const at = now();
        await repo.setChosen(tx, id, input.optionIds);
        const { netMinor } = estimateTotals(lines, input.optionIds, taxRateBasisPoints);
        await repo.bump(tx, id, { status: 'accepted', acceptedAt: at, acceptedBy: auth.userId, acceptedNetMinor: netMinor }, at);
        if (estimate.kind === 'original') await repo.supersedeOtherOriginals(tx, estimate.jobId, id, ['draft', 'issued'], at);
        let position = await repo.nextTaskPosition(tx, estimate.jobId);
        for (const line of linesInScope(lines, input.optionIds).filter((l) => l.kind === 'labour' && !l.taskId)) {
          const taskId = await repo.insertTask(tx, { workshopId: auth.workshopId, jobId: estimate.jobId, title: line.description, estimatedMinutes: line.minutes, position: position++, createdBy: auth.userId, createdAt: at, updatedAt: at });
          await repo.linkLineToTask(tx, line.id, taskId);
        }
        try {
          await tx.transaction((sp) => repo.applyLabourBudget(sp, estimate.jobId, at));
        } catch (err) {
          if (constraintOf(err) === 'tasks_estimate_range') throw statusError('A task would be budgeted above 500 hours. Split its labour over more tasks.');
          throw err;
        }
        if (isPlacing && stage) {
          await repo.placeOnBoard(tx, { workshopId: auth.workshopId, jobId: estimate.jobId, stageId: stage.id, byUserId: byClient ? null : auth.userId, at });
          await notifyLive(tx, auth.workshopId, 'job.created', estimate.jobId, at);
        }
        await notifyLive(tx, auth.workshopId, 'estimate.changed', estimate.jobId, at);
        await notifyLive(tx, auth.workshopId, 'task.changed', estimate.jobId, at);
        await notifyLive(tx, auth.workshopId, 'costing.changed', estimate.jobId, at);
        return view(auth, id, tx);
      }).catch((err: unknown) => {
        if (isUniqueViolation(err) && constraintOf(err) === 'estimates_one_accepted_original') throw statusError('This job already has an accepted estimate');
        throw err;
      }),

    decline: (auth: AuthContext, id: string): Promise<Estimate> =>
      write(auth.workshopId, async (tx) => {
        const estimate = await lockBoth(tx, auth, id);
        if (estimate.status !== 'issued') throw statusError('Only an issued estimate can be declined');
        const at = now();
        await repo.bump(tx, id, { status: 'declined', declinedAt: at }, at);
        await notifyLive(tx, auth.workshopId, 'estimate.changed', estimate.jobId, at);
        return view(auth, id, tx);
      }),
  };
}

export type EstimatesService = ReturnType<typeof createEstimatesService>;


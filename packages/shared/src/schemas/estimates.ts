import { z } from 'zod';
import { Id } from './common';
import { QuantityMilli } from './parts';
import { MinorAmount } from './settings';

/*
 * Estimates. A job's estimates are numbered revisions: drafted, issued (frozen), then accepted or
 * declined; issuing or accepting an original supersedes the job's other open originals. Once an
 * original is accepted, work found later is added as variations. Lines may belong to an option;
 * options sharing a `choice` are alternatives the client picks one of ("Hammers": "New hammers" or
 * "Recover the old ones"). Lines without an option are always included.
 *
 * Money rule (see packages/shared/src/domain/money.ts): each line's amount is rounded half-up to
 * the minor unit; tax is taken once on the total net, rounded half-up.
 *
 * Who sees what: the owner every field; the foreman prices and totals but no costs or margins;
 * technicians no money at all (those fields are absent).
 */

export const ESTIMATE_STATUSES = ['draft', 'issued', 'accepted', 'declined', 'superseded'] as const;
export const EstimateStatus = z.enum(ESTIMATE_STATUSES);
export type EstimateStatus = z.infer<typeof EstimateStatus>;

export const ESTIMATE_KINDS = ['original', 'variation'] as const;
export const EstimateKind = z.enum(ESTIMATE_KINDS, { error: 'Choose original or variation' });
export type EstimateKind = z.infer<typeof EstimateKind>;

export const ESTIMATE_LINE_KINDS = ['labour', 'part', 'sublet', 'other'] as const;
export const EstimateLineKind = z.enum(ESTIMATE_LINE_KINDS);
export type EstimateLineKind = z.infer<typeof EstimateLineKind>;

/** The editor's own name for an option, stable across edits, so lines can point at it. */
export const OptionKey = z.string({ error: 'Option key is required' }).regex(/^[A-Za-z0-9_-]{1,40}$/, { error: 'Use 1 to 40 letters, digits, - or _' });

const Text = (what: string, max: number) =>
  z.string({ error: `${what} is required` }).trim().min(1, { error: `${what} is required` }).max(max, { error: `${what} is too long` });

export const EstimateOptionInput = z.object({
  key: OptionKey,
  /** The question the options answer ("Hammers", "Case"); options with the same choice are alternatives. */
  choice: Text('Choice', 120),
  name: Text('Option name', 120),
});
export type EstimateOptionInput = z.infer<typeof EstimateOptionInput>;

/** Labour minutes on one line: up to 500 hours. */
export const LabourMinutes = z
  .number({ error: 'Enter minutes' })
  .int({ error: 'Use whole minutes' })
  .min(1, { error: 'Minutes must be above zero' })
  .max(30_000, { error: 'At most 500 hours on one line' });

const lineCommon = {
  /** An existing line of this estimate to keep (its hidden cost stays when `unitCostMinor` is left out). */
  id: Id.optional(),
  optionKey: OptionKey.nullable().optional(),
};

/**
 * One line. Labour: minutes × the hourly `unitPriceMinor` (the workshop's charge-out rate when
 * left out), linked to a task or, when `taskId` is left out, creating one on acceptance. Part:
 * a catalogue part; price and cost default to the catalogue's. Sublet: work sent out, with the
 * supplier's expected cost and the price to the client. Other: anything else.
 */
export const EstimateLineInput = z.discriminatedUnion(
  'kind',
  [
    z.object({ ...lineCommon, kind: z.literal('labour'), description: Text('Description', 300), taskId: Id.nullable().optional(), minutes: LabourMinutes, unitPriceMinor: MinorAmount.optional() }),
    z.object({
      ...lineCommon,
      kind: z.literal('part'),
      partId: Id,
      description: z.string().trim().max(300, { error: 'Description is too long' }).optional(),
      quantityMilli: QuantityMilli,
      unitPriceMinor: MinorAmount.optional(),
      unitCostMinor: MinorAmount.optional(),
    }),
    z.object({ ...lineCommon, kind: z.literal('sublet'), description: Text('Description', 300), quantityMilli: QuantityMilli.default(1000), unitPriceMinor: MinorAmount, unitCostMinor: MinorAmount.optional() }),
    z.object({ ...lineCommon, kind: z.literal('other'), description: Text('Description', 300), quantityMilli: QuantityMilli.default(1000), unitPriceMinor: MinorAmount, unitCostMinor: MinorAmount.optional() }),
  ],
  { error: 'Choose labour, part, sublet or other' },
);
export type EstimateLineInput = z.infer<typeof EstimateLineInput>;

const contentFields = {
  title: z.string().trim().max(200, { error: 'Title is too long' }),
  notes: z.string().trim().max(5000, { error: 'Notes are too long' }),
  options: z.array(EstimateOptionInput).max(20, { error: 'At most 20 options' }),
  lines: z.array(EstimateLineInput).max(300, { error: 'At most 300 lines' }),
};

type Content = { options?: EstimateOptionInput[]; lines?: Array<{ optionKey?: string | null; id?: string }> };

/** Option keys unique, every choice offering at least two options, lines pointing at known options. */
function checkContent(v: Content, ctx: z.RefinementCtx) {
  const options = v.options ?? [];
  const keys = new Set(options.map((o) => o.key));
  if (keys.size !== options.length) ctx.addIssue({ code: 'custom', message: 'An option key is used twice', path: ['options'] });
  const perChoice = new Map<string, number>();
  for (const o of options) perChoice.set(o.choice.toLowerCase(), (perChoice.get(o.choice.toLowerCase()) ?? 0) + 1);
  options.forEach((o, i) => {
    if (perChoice.get(o.choice.toLowerCase()) === 1) ctx.addIssue({ code: 'custom', message: 'A choice needs at least two options', path: ['options', i, 'choice'] });
  });
  if (v.lines && v.options) {
    v.lines.forEach((line, i) => {
      if (line.optionKey && !keys.has(line.optionKey)) ctx.addIssue({ code: 'custom', message: 'No option has this key', path: ['lines', i, 'optionKey'] });
    });
  }
  const ids = (v.lines ?? []).flatMap((l) => (l.id ? [l.id] : []));
  if (new Set(ids).size !== ids.length) ctx.addIssue({ code: 'custom', message: 'A line is listed twice', path: ['lines'] });
}

/**
 * `POST /api/jobs/:id/estimates` (owner, foreman): a draft. It is an original while the job has no
 * accepted original, else a variation (asking for the other kind answers 409). `copyFromId` starts
 * from another estimate of the job (a new revision of it) when no lines are given.
 */
export const CreateEstimateInput = z
  .object({
    kind: EstimateKind.optional(),
    copyFromId: Id.optional(),
    title: contentFields.title.default(''),
    notes: contentFields.notes.default(''),
    options: contentFields.options.optional(),
    lines: contentFields.lines.optional(),
  })
  .superRefine(checkContent)
  .refine((v) => !(v.copyFromId && (v.lines || v.options)), { error: 'Copy an estimate or give lines, not both', path: ['copyFromId'] });
export type CreateEstimateInput = z.infer<typeof CreateEstimateInput>;

/**
 * `PATCH /api/estimates/:id` (owner, foreman) while it is a draft. `options` and `lines` each
 * replace the whole list (lines then refer to the new options by key); edits carry the version.
 */
export const UpdateEstimateInput = z
  .object({
    version: z.number({ error: 'Version must be a number' }).int().min(1),
    title: contentFields.title.optional(),
    notes: contentFields.notes.optional(),
    options: contentFields.options.optional(),
    lines: contentFields.lines.optional(),
  })
  .superRefine(checkContent)
  .refine(({ version: _version, ...changes }) => Object.values(changes).some((x) => x !== undefined), { error: 'Nothing to change', path: ['title'] });
export type UpdateEstimateInput = z.infer<typeof UpdateEstimateInput>;

/** `POST /api/estimates/:id/accept`: exactly one option of each choice (none when there are no options). */
export const AcceptEstimateInput = z.object({
  optionIds: z
    .array(Id)
    .max(20)
    .refine((ids) => new Set(ids).size === ids.length, { error: 'An option is listed twice' })
    .default([]),
});
export type AcceptEstimateInput = z.infer<typeof AcceptEstimateInput>;

/** Net, tax and gross in minor units. */
export const MoneyTotals = z.object({ netMinor: z.number(), taxMinor: z.number(), grossMinor: z.number() });
export type MoneyTotals = z.infer<typeof MoneyTotals>;

export const EstimateOption = z.object({
  id: z.string(),
  key: z.string(),
  choice: z.string(),
  name: z.string(),
  /** Chosen when the estimate was accepted. */
  isChosen: z.boolean(),
  /** Owner and foreman: the option's own lines, net. */
  netMinor: z.number().optional(),
});
export type EstimateOption = z.infer<typeof EstimateOption>;

export const EstimateLine = z.object({
  id: z.string(),
  position: z.number(),
  kind: EstimateLineKind,
  description: z.string(),
  task: z.object({ id: z.string(), title: z.string() }).nullable(),
  part: z.object({ id: z.string(), sku: z.string(), name: z.string(), unit: z.string() }).nullable(),
  /** Labour lines: minutes; others null. */
  minutes: z.number().nullable(),
  /** Non-labour lines: thousandths of the unit; labour null. */
  quantityMilli: z.number().nullable(),
  optionId: z.string().nullable(),
  optionKey: z.string().nullable(),
  /** Owner and foreman: price of one unit (of an hour, for labour). */
  unitPriceMinor: z.number().optional(),
  /** Owner and foreman: the line's amount, rounded half-up. */
  amountMinor: z.number().optional(),
  /** Owner only: expected cost of one unit (parts, sublet, other); null when not known. */
  unitCostMinor: z.number().nullable().optional(),
  /** Owner only: expected cost of the line; null for labour (costed by technicians' rates) or when not known. */
  costMinor: z.number().nullable().optional(),
});
export type EstimateLine = z.infer<typeof EstimateLine>;

export const Estimate = z.object({
  id: z.string(),
  jobId: z.string(),
  /** 1, 2, 3… per job, across originals and variations. */
  revision: z.number(),
  kind: EstimateKind,
  status: EstimateStatus,
  title: z.string(),
  notes: z.string(),
  version: z.number(),
  currency: z.string(),
  /** Labour minutes in scope (the chosen options, or the first option of each choice before acceptance). */
  labourMinutes: z.number(),
  options: z.array(EstimateOption),
  lines: z.array(EstimateLine),
  /** Owner and foreman: lines without an option, net. */
  baseNetMinor: z.number().optional(),
  /**
   * Owner and foreman: totals of the lines in scope: always-included lines plus the chosen options
   * once accepted; before that, the first option of each choice.
   */
  totals: MoneyTotals.optional(),
  taxRateBasisPoints: z.number().optional(),
  issuedAt: z.string().nullable(),
  acceptedAt: z.string().nullable(),
  declinedAt: z.string().nullable(),
  createdBy: z.object({ id: z.string(), name: z.string() }).nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Estimate = z.infer<typeof Estimate>;

/** `GET /api/jobs/:id/estimates`: every revision, oldest first, and what has been agreed. */
export const JobEstimates = z.object({
  estimates: z.array(Estimate),
  agreed: z.object({
    /** Accepted original plus accepted variations. */
    estimateIds: z.array(z.string()),
    labourMinutes: z.number(),
    /** Owner and foreman: the agreed price, ex tax. */
    netMinor: z.number().optional(),
  }),
});
export type JobEstimates = z.infer<typeof JobEstimates>;

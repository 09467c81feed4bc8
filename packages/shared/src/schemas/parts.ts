import { z } from 'zod';
import { MAX_QUANTITY_MILLI, parseQuantityMilli } from '../domain/quantity';
import { Id } from './common';
import { BasisPoints, MinorAmount } from './settings';

/*
 * Parts catalogue and stock. Quantities are integer thousandths of the part's unit (1.5 m = 1500)
 * and stock on hand is the sum of the part's movements. Cost of a part used = the moving weighted
 * average cost at that moment, kept on the movement. Who sees what: the owner every field; the
 * foreman sell prices and quantities but no costs or markups; technicians quantities only.
 */

const PersonRef = z.object({ id: z.string(), name: z.string() });
const Ref = z.object({ id: z.string(), title: z.string() });

/** Thousandths of a unit, above zero. */
export const QuantityMilli = z
  .number({ error: 'Enter a quantity' })
  .int({ error: 'Quantity must be whole thousandths of the unit' })
  .min(1, { error: 'Quantity must be above zero' })
  .max(MAX_QUANTITY_MILLI, { error: 'Quantity is too large' });

/** Thousandths of a unit, above or below zero (an adjustment). */
export const SignedQuantityMilli = z
  .number({ error: 'Enter a quantity' })
  .int({ error: 'Quantity must be whole thousandths of the unit' })
  .min(-MAX_QUANTITY_MILLI, { error: 'Quantity is too large' })
  .max(MAX_QUANTITY_MILLI, { error: 'Quantity is too large' })
  .refine((q) => q !== 0, { error: 'Quantity cannot be zero' });

/**
 * Lets a body give `quantity` as a decimal ("1.5" or 1.5, at most three decimals) instead of
 * `quantityMilli`; it is turned into `quantityMilli` exactly. `quantityMilli` wins when both are sent.
 */
const quantityAsMilli = (body: unknown, ctx: { addIssue: (issue: { code: 'custom'; message: string; path: string[]; input: unknown }) => void }) => {
  if (typeof body !== 'object' || body === null || Array.isArray(body)) return body;
  const { quantity, ...rest } = body as Record<string, unknown>;
  if (quantity === undefined || 'quantityMilli' in rest) return body;
  const milli = typeof quantity === 'string' || typeof quantity === 'number' ? parseQuantityMilli(quantity) : null;
  if (milli === null) ctx.addIssue({ code: 'custom', message: 'Enter a number with at most three decimals', path: ['quantity'], input: quantity });
  return { ...rest, quantityMilli: milli ?? undefined };
};
const withQuantity = <T extends z.ZodType>(schema: T) => z.preprocess(quantityAsMilli, schema);

const Text = (what: string, max: number) =>
  z.string({ error: `${what} is required` }).trim().min(1, { error: `${what} is required` }).max(max, { error: `${what} is too long` });
const Reason = z.string({ error: 'Say why' }).trim().min(3, { error: 'Say why, in a few words' }).max(500, { error: 'Reason is too long' });

/** Stock-keeping unit: letters, digits, dots, dashes and slashes; unique in the workshop (any case). */
export const Sku = z
  .string({ error: 'SKU is required' })
  .trim()
  .min(1, { error: 'SKU is required' })
  .max(40, { error: 'SKU is too long' })
  .regex(/^[A-Za-z0-9][A-Za-z0-9./_-]*$/, { error: 'Use letters, digits, dots, dashes and slashes' });

const partFields = {
  sku: Sku,
  name: Text('Name', 200),
  /** What one unit is: "set", "m", "coil (1 lb)", "box of 100". */
  unit: Text('Unit', 40),
  supplier: z.string().trim().max(200, { error: 'Supplier is too long' }),
  unitCostMinor: MinorAmount,
  /** A fixed sell price, or null when the price follows the cost by `markupBasisPoints`. */
  sellPriceMinor: MinorAmount.nullable(),
  /** Markup on cost (2500 = 25 %), or null for a fixed sell price. */
  markupBasisPoints: BasisPoints.max(100_000, { error: 'Markup is too large' }).nullable(),
  /** Low stock at or below this many thousandths. */
  reorderLevelMilli: z.number().int({ error: 'Use whole thousandths' }).min(0, { error: 'Cannot be negative' }).max(MAX_QUANTITY_MILLI),
  isActive: z.boolean(),
};

const onePrice = (v: { sellPriceMinor?: number | null; markupBasisPoints?: number | null }) =>
  !(v.sellPriceMinor != null && v.markupBasisPoints != null);

/** `POST /api/parts` (owner). Give a sell price or a markup, not both. */
export const CreatePartInput = z
  .object({
    ...partFields,
    supplier: partFields.supplier.default(''),
    sellPriceMinor: partFields.sellPriceMinor.optional(),
    markupBasisPoints: partFields.markupBasisPoints.optional(),
    reorderLevelMilli: partFields.reorderLevelMilli.default(0),
    isActive: partFields.isActive.default(true),
  })
  .refine(onePrice, { error: 'Give a sell price or a markup, not both', path: ['markupBasisPoints'] })
  .refine((v) => v.sellPriceMinor != null || v.markupBasisPoints != null, { error: 'Give a sell price or a markup', path: ['sellPriceMinor'] });
export type CreatePartInput = z.infer<typeof CreatePartInput>;

/** `PATCH /api/parts/:id` (owner). Setting one of sell price and markup clears the other. */
export const UpdatePartInput = z
  .object(partFields)
  .partial()
  .refine(onePrice, { error: 'Give a sell price or a markup, not both', path: ['markupBasisPoints'] })
  .refine((v) => Object.values(v).some((x) => x !== undefined), { error: 'Nothing to change', path: ['name'] });
export type UpdatePartInput = z.infer<typeof UpdatePartInput>;

export const PartListQuery = z.object({
  q: z.string().trim().max(200).optional(),
  /** `true`: only parts at or below their reorder level. */
  lowStock: z.enum(['true', 'false']).transform((v) => v === 'true').optional(),
  /** Inactive parts are left out unless `all`. */
  include: z.enum(['active', 'all']).default('active'),
});
export type PartListQuery = z.infer<typeof PartListQuery>;

export const Part = z.object({
  id: z.string(),
  sku: z.string(),
  name: z.string(),
  unit: z.string(),
  supplier: z.string(),
  reorderLevelMilli: z.number(),
  isActive: z.boolean(),
  /** The sum of the part's stock movements. */
  onHandMilli: z.number(),
  /** On hand at or below the reorder level. */
  isLowStock: z.boolean(),
  /** Owner and foreman: the price one unit sells for (fixed, or cost plus markup). */
  sellPriceMinor: z.number().optional(),
  /** Owner only. */
  unitCostMinor: z.number().optional(),
  markupBasisPoints: z.number().nullable().optional(),
  /** Owner only: moving weighted average cost of one unit in stock; null when none is on hand. */
  averageUnitCostMinor: z.number().nullable().optional(),
  /** Owner only: value of the stock on hand at its weighted average cost. */
  stockValueMinor: z.number().optional(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Part = z.infer<typeof Part>;

export const PartList = z.object({ parts: z.array(Part), lowStockCount: z.number() });
export type PartList = z.infer<typeof PartList>;

// ── Stock movements ──────────────────────────────────────────────────────────

export const STOCK_MOVEMENT_KINDS = ['received', 'used', 'returned', 'adjusted'] as const;
export const StockMovementKind = z.enum(STOCK_MOVEMENT_KINDS);
export type StockMovementKind = z.infer<typeof StockMovementKind>;

/**
 * `POST /api/parts/:id/movements` (owner, foreman): a delivery received (at its unit cost, the
 * catalogue cost when left out), unused parts returned from a task into stock, or a stock-count
 * adjustment with its reason. Parts used go through `POST /api/tasks/:id/parts-used`.
 */
export const CreateStockMovementInput = withQuantity(
  z.discriminatedUnion(
    'kind',
    [
      z.object({ kind: z.literal('received'), quantityMilli: QuantityMilli, unitCostMinor: MinorAmount.optional(), reason: z.string().trim().max(500).optional() }),
      z.object({ kind: z.literal('returned'), quantityMilli: QuantityMilli, taskId: Id, reason: z.string().trim().max(500).optional() }),
      z.object({ kind: z.literal('adjusted'), quantityMilli: SignedQuantityMilli, reason: Reason }),
    ],
    { error: 'Choose received, returned or adjusted' },
  ),
);
export type CreateStockMovementInput = z.infer<typeof CreateStockMovementInput>;

/** `POST /api/tasks/:id/parts-used` and the wall screen: parts taken from stock for a task. */
export const PartsUsedInput = withQuantity(z.object({ partId: Id, quantityMilli: QuantityMilli }));
export type PartsUsedInput = z.infer<typeof PartsUsedInput>;

/**
 * `POST /api/tasks/:id/parts-used/corrections` (owner, foreman): fixes a wrong record of parts used
 * on the task: positive when more was used than recorded, negative when less. Kept as an adjusting
 * movement with its reason.
 */
export const PartsUsedCorrectionInput = withQuantity(z.object({ partId: Id, quantityMilli: SignedQuantityMilli, reason: Reason }));
export type PartsUsedCorrectionInput = z.infer<typeof PartsUsedCorrectionInput>;

export const StockMovement = z.object({
  id: z.string(),
  partId: z.string(),
  kind: StockMovementKind,
  /** Signed: into stock above zero, out of stock below. */
  quantityMilli: z.number(),
  task: Ref.nullable(),
  job: Ref.nullable(),
  reason: z.string().nullable(),
  by: PersonRef.nullable(),
  at: z.string(),
  /** Owner only: the weighted average (or received) cost of one unit at the time. */
  unitCostMinor: z.number().optional(),
  /** Owner only: the stock value the movement moved, signed like the quantity. */
  valueMinor: z.number().optional(),
});
export type StockMovement = z.infer<typeof StockMovement>;

export const PartDetail = Part.extend({ movements: z.array(StockMovement) });
export type PartDetail = z.infer<typeof PartDetail>;

/** What recording a movement answers: the movement and the part as it now stands. */
export const StockMovementResult = z.object({ movement: StockMovement, part: Part });
export type StockMovementResult = z.infer<typeof StockMovementResult>;

/** `GET /api/tasks/:id/parts-used`: the task's part movements and the net quantity of each part. */
export const TaskPartsUsed = z.object({
  movements: z.array(StockMovement),
  totals: z.array(z.object({ partId: z.string(), sku: z.string(), name: z.string(), unit: z.string(), quantityMilli: z.number(), costMinor: z.number().optional() })),
});
export type TaskPartsUsed = z.infer<typeof TaskPartsUsed>;

/** The wall screen's parts picker: active parts, no money; low stock is on hand at or below the reorder level. */
export const WallPart = z.object({ id: z.string(), sku: z.string(), name: z.string(), unit: z.string(), onHandMilli: z.number(), isLowStock: z.boolean() });
export type WallPart = z.infer<typeof WallPart>;
export const WallPartList = z.object({ parts: z.array(WallPart) });
export type WallPartList = z.infer<typeof WallPartList>;

/** `POST /api/wall/parts-used`: the technician's PIN, the task and the part. */
export const WallPartsUsedInput = withQuantity(
  z.object({ technicianId: Id, pin: z.string({ error: 'Enter the 6-digit PIN' }).regex(/^\d{6}$/, { error: 'The PIN is 6 digits' }), taskId: Id, partId: Id, quantityMilli: QuantityMilli }),
);
export type WallPartsUsedInput = z.infer<typeof WallPartsUsedInput>;

// ── Sublet bills (owner only) ────────────────────────────────────────────────

/** A supplier's bill for work sent out on a job (e.g. a refinish), recorded when it arrives. */
export const CreateSubletBillInput = z.object({
  supplier: Text('Supplier', 200),
  description: Text('Description', 500),
  costMinor: MinorAmount.min(1, { error: 'Cost must be above zero' }),
  receivedOn: z.iso.date({ error: 'Use a date like 2026-12-24' }),
});
export type CreateSubletBillInput = z.infer<typeof CreateSubletBillInput>;

export const SubletBill = z.object({
  id: z.string(),
  jobId: z.string(),
  supplier: z.string(),
  description: z.string(),
  costMinor: z.number(),
  receivedOn: z.string(),
  createdAt: z.string(),
});
export type SubletBill = z.infer<typeof SubletBill>;
export const SubletBillList = z.object({ bills: z.array(SubletBill) });
export type SubletBillList = z.infer<typeof SubletBillList>;

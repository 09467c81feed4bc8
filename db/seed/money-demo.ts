/**
 * Money of the demo scenario (shared/SCENARIO.md): Fennick Cross Piano Works' settings, its
 * technicians' cost rates, the parts catalogue with opening stock, the jobs' estimates (Harriet
 * Pembleton's grand accepted with new hammers, her case awaiting her choice, the school's upright
 * and Oscar Feld's grand accepted, a variation for a cracked bridge, Ines Carvalho's declined),
 * parts used and the refinisher's bill. Fixed ids keep the seed idempotent.
 */
import { DEMO_JOBS, DEMO_MEMBERS } from './demo';
import { DEMO_TASKS } from './bench-demo';

export const DEMO_SETTINGS = { taxRateBasisPoints: 2000, labourRateMinorPerHour: 5500, targetMarginBasisPoints: 2500 } as const;

const [, , PRIYA, DECLAN, ANA] = DEMO_MEMBERS.map((m) => m.id);
const [SALON, CASE, LINWOOD, PARLOUR, INES] = DEMO_JOBS.map((j) => j.id);

/** Cost rates (SCENARIO.md) from the first Monday of 2025. */
export const DEMO_COST_RATES = [
  { id: 'a1e49b07-2c3d-4e5f-8a6b-0c1d2e3f4a01', userId: PRIYA!, effectiveFrom: '2025-01-06', rateMinorPerHour: 2400 },
  { id: 'a1e49b07-2c3d-4e5f-8a6b-0c1d2e3f4a02', userId: DECLAN!, effectiveFrom: '2025-01-06', rateMinorPerHour: 2200 },
  { id: 'a1e49b07-2c3d-4e5f-8a6b-0c1d2e3f4a03', userId: ANA!, effectiveFrom: '2025-01-06', rateMinorPerHour: 2000 },
];

const partId = (n: number) => `b2f5ac18-3d4e-4f60-9b7c-1d2e3f4a5b${String(n).padStart(2, '0')}`;

/** The catalogue; `receipts` are deliveries (quantity in thousandths, unit cost) some weeks before the seed day. */
export const DEMO_PARTS = [
  { id: partId(1), sku: 'HS-G88', name: 'Hammer set, grand, 88', unit: 'set', supplier: 'Larkspur Felts', unitCostMinor: 52000, sellPriceMinor: 69000, reorderLevelMilli: 0, receipts: [] },
  { id: partId(2), sku: 'HS-U88', name: 'Hammer set, upright, 88', unit: 'set', supplier: 'Larkspur Felts', unitCostMinor: 41000, sellPriceMinor: 54500, reorderLevelMilli: 0, receipts: [[1000, 41000]] },
  { id: partId(3), sku: 'KBC-1', name: 'Key bushing cloth', unit: 'm', supplier: 'Larkspur Felts', unitCostMinor: 1800, sellPriceMinor: 2400, reorderLevelMilli: 5000, receipts: [[8000, 1800], [4000, 1950]] },
  { id: partId(4), sku: 'DF-U', name: 'Damper felt set, upright', unit: 'set', supplier: 'Larkspur Felts', unitCostMinor: 9500, sellPriceMinor: 13000, reorderLevelMilli: 1000, receipts: [[2000, 9500]] },
  { id: partId(5), sku: 'MW-16', name: 'Music wire, plain steel, size 16', unit: 'coil (1 lb)', supplier: 'Quayside Wire Co.', unitCostMinor: 1450, sellPriceMinor: 1900, reorderLevelMilli: 2000, receipts: [[6000, 1450]] },
  { id: partId(6), sku: 'TP-20', name: 'Tuning pins, 2/0, blued', unit: 'box of 100', supplier: 'Quayside Wire Co.', unitCostMinor: 6200, sellPriceMinor: 8000, reorderLevelMilli: 2000, receipts: [[3000, 6200]] },
  { id: partId(7), sku: 'SF-1', name: 'Shellac flakes', unit: 'kg', supplier: 'Larkspur Felts', unitCostMinor: 3800, sellPriceMinor: 4800, reorderLevelMilli: 1000, receipts: [[2000, 3800]] },
] as const;

const [GRAND_HAMMERS, UPRIGHT_HAMMERS, CLOTH, DAMPER_FELTS, WIRE, PINS, SHELLAC] = DEMO_PARTS.map((p) => p.id);

const taskId = (n: number) => DEMO_TASKS.find((t) => t.id.endsWith(String(n).padStart(2, '0')))!.id;

export type DemoLine =
  | { kind: 'labour'; description: string; minutes: number; taskId?: string; option?: string }
  | { kind: 'part'; partId: string; quantityMilli: number; option?: string }
  | { kind: 'sublet' | 'other'; description: string; quantityMilli: number; unitPriceMinor: number; unitCostMinor: number | null; option?: string };

export interface DemoEstimate {
  id: string;
  jobId: string;
  revision: number;
  kind: 'original' | 'variation';
  status: 'issued' | 'accepted' | 'declined';
  title: string;
  /** Days before the seed day it was issued, and accepted or declined. */
  issuedDaysAgo: number;
  decidedDaysAgo: number | null;
  options: Array<{ key: string; choice: string; name: string; isChosen: boolean }>;
  lines: DemoLine[];
}

const estimateId = (n: number) => `d4b7ce3a-5f60-4182-9d9e-3f4a5b6c7d${String(n).padStart(2, '0')}`;
const two = (n: number) => String(n).padStart(2, '0');
export const demoOptionId = (estimate: number, n: number) => `e5c8df4b-6071-4293-8eaf-4a5b6c7d${two(estimate)}${two(n)}`;
export const demoLineId = (estimate: number, n: number) => `f6d9e05c-7182-43a4-9fb0-5b6c7d8e${two(estimate)}${two(n)}`;

const REFINISH = { kind: 'sublet', description: 'Black polyester refinish (sublet to Heathside Finishers)', quantityMilli: 1000, unitPriceMinor: 185000, unitCostMinor: 145000 } as const;

export const DEMO_ESTIMATES: DemoEstimate[] = [
  {
    id: estimateId(1),
    jobId: SALON!,
    revision: 1,
    kind: 'original',
    status: 'accepted',
    title: 'Salon grand: new hammers or recovered, rebush, full regulation',
    issuedDaysAgo: 32,
    decidedDaysAgo: 30,
    options: [
      { key: 'new-hammers', choice: 'Hammers', name: 'New hammers', isChosen: true },
      { key: 'recover-hammers', choice: 'Hammers', name: 'Recover the old ones', isChosen: false },
    ],
    lines: [
      { kind: 'labour', description: 'Remove action and keys', minutes: 90, taskId: taskId(1) },
      { kind: 'labour', description: 'Remove old hammers', minutes: 90, taskId: taskId(2) },
      { kind: 'labour', description: 'Rebush keys', minutes: 300, taskId: taskId(3) },
      { kind: 'part', partId: CLOTH!, quantityMilli: 2500 },
      { kind: 'labour', description: 'Hang new hammers', minutes: 360, taskId: taskId(4), option: 'new-hammers' },
      { kind: 'labour', description: 'Travel and space', minutes: 150, taskId: taskId(5), option: 'new-hammers' },
      { kind: 'labour', description: 'Shape and voice', minutes: 240, taskId: taskId(6), option: 'new-hammers' },
      { kind: 'part', partId: GRAND_HAMMERS!, quantityMilli: 1000, option: 'new-hammers' },
      { kind: 'labour', description: 'Recover and reshape the old hammers', minutes: 600, option: 'recover-hammers' },
      { kind: 'labour', description: 'Full regulation', minutes: 600, taskId: taskId(7) },
      { kind: 'labour', description: 'Fine tuning', minutes: 90, taskId: taskId(8) },
    ],
  },
  {
    id: estimateId(2),
    jobId: CASE!,
    revision: 1,
    kind: 'original',
    status: 'issued',
    title: 'Salon grand case: revive the shellac or strip and refinish',
    issuedDaysAgo: 28,
    decidedDaysAgo: null,
    options: [
      { key: 'revive', choice: 'Case', name: 'Revive the shellac', isChosen: false },
      { key: 'refinish', choice: 'Case', name: 'Strip and refinish', isChosen: false },
    ],
    lines: [
      { kind: 'labour', description: 'Test patch: revive the shellac under the lid', minutes: 90, taskId: taskId(10) },
      { kind: 'labour', description: 'Revive the shellac', minutes: 600, option: 'revive' },
      { kind: 'part', partId: SHELLAC!, quantityMilli: 500, option: 'revive' },
      { ...REFINISH, description: 'Strip and refinish the case (sublet to Heathside Finishers)', option: 'refinish' },
    ],
  },
  {
    id: estimateId(3),
    jobId: LINWOOD!,
    revision: 1,
    kind: 'original',
    status: 'accepted',
    title: 'Osterholt upright: moth damage',
    issuedDaysAgo: 42,
    decidedDaysAgo: 41,
    options: [],
    lines: [
      { kind: 'labour', description: 'Rebush keys (moth damage)', minutes: 240, taskId: taskId(11) },
      { kind: 'part', partId: CLOTH!, quantityMilli: 2000 },
      { kind: 'labour', description: 'Fit new damper felts', minutes: 180, taskId: taskId(12) },
      { kind: 'part', partId: DAMPER_FELTS!, quantityMilli: 1000 },
      { kind: 'labour', description: 'Regulate the action', minutes: 420, taskId: taskId(13) },
      { kind: 'labour', description: 'Pitch raise', minutes: 120, taskId: taskId(14) },
      { kind: 'labour', description: 'Fine tuning', minutes: 90, taskId: taskId(15) },
      { kind: 'labour', description: 'Clean and polish the case', minutes: 90, taskId: taskId(16) },
    ],
  },
  {
    id: estimateId(4),
    jobId: PARLOUR!,
    revision: 1,
    kind: 'original',
    status: 'accepted',
    title: 'Parlour grand: restring, new tuning pins, soundboard crack, refinish',
    issuedDaysAgo: 13,
    decidedDaysAgo: 12,
    options: [],
    lines: [
      { kind: 'labour', description: 'Remove strings and tuning pins', minutes: 240, taskId: taskId(20) },
      { kind: 'labour', description: 'Remove action for safe keeping', minutes: 60, taskId: taskId(21) },
      { kind: 'labour', description: 'Repair the soundboard crack', minutes: 480, taskId: taskId(22) },
      { kind: 'labour', description: 'Restring with new tuning pins', minutes: 1350, taskId: taskId(23) },
      { kind: 'part', partId: WIRE!, quantityMilli: 4000 },
      { kind: 'part', partId: PINS!, quantityMilli: 3000 },
      { kind: 'labour', description: 'Touch up the satin lacquer', minutes: 180, taskId: taskId(24) },
      REFINISH,
    ],
  },
  {
    id: estimateId(5),
    jobId: PARLOUR!,
    revision: 2,
    kind: 'variation',
    status: 'accepted',
    title: 'Variation: cracked treble bridge found under the strings',
    issuedDaysAgo: 3,
    decidedDaysAgo: 2,
    options: [],
    // Found once the strings were off; done with the soundboard repair, so it adds to that task's budget.
    lines: [{ kind: 'labour', description: 'Repair the cracked treble bridge', minutes: 240, taskId: taskId(22) }],
  },
  {
    id: estimateId(6),
    jobId: INES!,
    revision: 1,
    kind: 'original',
    status: 'declined',
    title: 'Upright: new hammers, rebush, regulation',
    issuedDaysAgo: 58,
    decidedDaysAgo: 50,
    options: [],
    lines: [
      { kind: 'labour', description: 'Hang new hammers', minutes: 360 },
      { kind: 'part', partId: UPRIGHT_HAMMERS!, quantityMilli: 1000 },
      { kind: 'labour', description: 'Rebush keys', minutes: 240 },
      { kind: 'part', partId: CLOTH!, quantityMilli: 2000 },
      { kind: 'labour', description: 'Regulate the action', minutes: 480 },
    ],
  },
];

/** Parts used on tasks, oldest first. */
export const DEMO_PARTS_USED = [
  { id: 'a7eaf16d-8293-44b5-8a01-6c7d8e9fa001', partId: CLOTH!, taskId: taskId(11), quantityMilli: 2000, daysAgo: 34, byUserId: PRIYA! },
  { id: 'a7eaf16d-8293-44b5-8a01-6c7d8e9fa002', partId: DAMPER_FELTS!, taskId: taskId(12), quantityMilli: 1000, daysAgo: 33, byUserId: PRIYA! },
  { id: 'a7eaf16d-8293-44b5-8a01-6c7d8e9fa003', partId: CLOTH!, taskId: taskId(3), quantityMilli: 2500, daysAgo: 3, byUserId: PRIYA! },
];

/** The refinisher's bill for Oscar Feld's case. */
export const DEMO_SUBLET_BILLS = [
  { id: 'b8fb027e-93a4-45c6-9b12-7d8e9fab0001', jobId: PARLOUR!, supplier: 'Heathside Finishers', description: 'Black polyester refinish of the case', costMinor: 145000, daysAgo: 3 },
];

/**
 * The invented demo scenario (shared/SCENARIO.md): Fennick Cross Piano Works and its people.
 * Fixed ids keep the seed idempotent: a second run finds every row and changes nothing.
 */
import type { DEFAULT_STAGE_NAMES } from '@keybed/shared';

export const DEMO_PASSWORD = 'keybed-demo';

export const DEMO_WORKSHOP = {
  id: '0b1d6c2e-5a4f-4c8e-9a51-7f3e2d1c0a01',
  name: 'Fennick Cross Piano Works',
  currency: 'GBP',
  timeZone: 'Europe/London',
} as const;

export const DEMO_MEMBERS = [
  { id: '1f6a0e52-3b9c-4d71-8e2a-0c5b7d9e1a01', email: 'margaret@fennick.example', name: 'Margaret Oyelaran', role: 'owner' },
  { id: '1f6a0e52-3b9c-4d71-8e2a-0c5b7d9e1a02', email: 'tom@fennick.example', name: 'Tom Albright', role: 'foreman' },
  { id: '1f6a0e52-3b9c-4d71-8e2a-0c5b7d9e1a03', email: 'priya@fennick.example', name: 'Priya Natarajan', role: 'technician' },
  { id: '1f6a0e52-3b9c-4d71-8e2a-0c5b7d9e1a04', email: 'declan@fennick.example', name: 'Declan Moss', role: 'technician' },
  { id: '1f6a0e52-3b9c-4d71-8e2a-0c5b7d9e1a05', email: 'ana@fennick.example', name: 'Ana Sousa', role: 'technician' },
] as const;

export const DEMO_CLIENTS = [
  { id: '2c7d1f63-4a0e-4b82-9f3b-1d6e8a0b2c01', name: 'Harriet Pembleton', email: 'harriet@pembleton.example', phone: '01632 960555', address: '3 Mill Lane\nFennick Cross', notes: 'Prefers a call before any decision on the case.' },
  { id: '2c7d1f63-4a0e-4b82-9f3b-1d6e8a0b2c02', name: 'Linwood Hall School (music dept.)', email: 'music@linwoodhall.example', phone: '01632 960210', address: 'Linwood Hall School\nChapel Road\nFennick Cross', notes: 'Deliveries in term time before 08:30 only.' },
  { id: '2c7d1f63-4a0e-4b82-9f3b-1d6e8a0b2c03', name: 'Oscar Feld', email: 'oscar@feld.example', phone: '01632 960788', address: '17 Weir Street\nFennick Cross', notes: '' },
  { id: '2c7d1f63-4a0e-4b82-9f3b-1d6e8a0b2c04', name: 'Ines Carvalho', email: 'ines@carvalho.example', phone: null, address: null, notes: 'Estimate declined; may come back next year.' },
] as const;

export const DEMO_PIANOS = [
  { id: '3d8e2a74-5b1f-4c93-8a4c-2e7f9b1c3d01', clientId: DEMO_CLIENTS[0].id, maker: 'Carrow & Finch', model: 'Salon', serialNumber: 'CF-19114', type: 'grand', sizeMm: 1778, yearApprox: 1911, caseFinish: 'Figured rosewood, shellac', keytopMaterial: 'ivory', notes: 'Deeply grooved hammers, loose key bushings.' },
  { id: '3d8e2a74-5b1f-4c93-8a4c-2e7f9b1c3d02', clientId: DEMO_CLIENTS[1].id, maker: 'Osterholt', model: '', serialNumber: 'OH-62-4471', type: 'upright', sizeMm: 1260, yearApprox: 1962, caseFinish: 'Walnut veneer', keytopMaterial: 'plastic', notes: 'Moth in key bushings and damper felts.' },
  { id: '3d8e2a74-5b1f-4c93-8a4c-2e7f9b1c3d03', clientId: DEMO_CLIENTS[2].id, maker: 'Brandauer & Sons', model: 'Parlour', serialNumber: 'BS-26-118', type: 'grand', sizeMm: 1575, yearApprox: 1926, caseFinish: 'Black satin lacquer', keytopMaterial: 'plastic', notes: 'Soundboard crack along the grain, bass side.' },
  { id: '3d8e2a74-5b1f-4c93-8a4c-2e7f9b1c3d04', clientId: DEMO_CLIENTS[3].id, maker: 'Carrow & Finch', model: '', serialNumber: '', type: 'upright', sizeMm: null, yearApprox: 1898, caseFinish: '', keytopMaterial: 'ivory', notes: 'Overstrung.' },
] as const;

type StageName = (typeof DEFAULT_STAGE_NAMES)[number];

export interface DemoJob {
  id: string;
  pianoId: string;
  title: string;
  status: 'active' | 'on_hold' | 'done' | 'cancelled';
  priority: 'low' | 'normal' | 'high' | 'urgent';
  /** Days from the seed's run date; negative is already past (overdue while on the board). */
  promisedInDays: number | null;
  blockedReason: string | null;
  notes: string;
  /** Stages the job went through, oldest first, each with how many days before the seed run; the last is where it is. */
  path: Array<{ stage: StageName; daysAgo: number; eventId: string }>;
}

const DAY_MS = 24 * 3600_000;

export const DEMO_JOBS: DemoJob[] = [
  {
    id: '4e9f3b85-6c2a-4da4-9b5d-3f8a0c2d4e01',
    pianoId: DEMO_PIANOS[0].id,
    title: 'New hammers, rebush keys, full regulation',
    status: 'active',
    priority: 'high',
    promisedInDays: 42,
    blockedReason: 'Waiting for parts: grand hammer set from Larkspur Felts',
    notes: 'Ivory keytops: keep and clean, do not replace.',
    path: [
      { stage: 'Intake', daysAgo: 30, eventId: '5fa04c96-7d3b-4eb5-8c6e-4a9b1d3e5f01' },
      { stage: 'Strip-down', daysAgo: 24, eventId: '5fa04c96-7d3b-4eb5-8c6e-4a9b1d3e5f02' },
      { stage: 'Hammers', daysAgo: 9, eventId: '5fa04c96-7d3b-4eb5-8c6e-4a9b1d3e5f03' },
    ],
  },
  {
    id: '4e9f3b85-6c2a-4da4-9b5d-3f8a0c2d4e02',
    pianoId: DEMO_PIANOS[0].id,
    title: 'Case: revive the shellac or strip and refinish',
    status: 'on_hold',
    priority: 'normal',
    promisedInDays: null,
    blockedReason: null,
    notes: 'Client to choose after seeing a test patch on the underside of the lid.',
    path: [{ stage: 'Intake', daysAgo: 30, eventId: '5fa04c96-7d3b-4eb5-8c6e-4a9b1d3e5f04' }],
  },
  {
    id: '4e9f3b85-6c2a-4da4-9b5d-3f8a0c2d4e03',
    pianoId: DEMO_PIANOS[1].id,
    title: 'Moth damage: rebush, new dampers, pitch raise',
    status: 'active',
    priority: 'urgent',
    promisedInDays: -5,
    blockedReason: null,
    notes: 'Needed back for the spring concert rehearsals.',
    path: [
      { stage: 'Intake', daysAgo: 40, eventId: '5fa04c96-7d3b-4eb5-8c6e-4a9b1d3e5f05' },
      { stage: 'Strip-down', daysAgo: 35, eventId: '5fa04c96-7d3b-4eb5-8c6e-4a9b1d3e5f06' },
      { stage: 'Hammers', daysAgo: 20, eventId: '5fa04c96-7d3b-4eb5-8c6e-4a9b1d3e5f07' },
      { stage: 'Regulation', daysAgo: 6, eventId: '5fa04c96-7d3b-4eb5-8c6e-4a9b1d3e5f08' },
    ],
  },
  {
    id: '4e9f3b85-6c2a-4da4-9b5d-3f8a0c2d4e04',
    pianoId: DEMO_PIANOS[2].id,
    title: 'Full restring, new tuning pins, soundboard crack repair',
    status: 'active',
    priority: 'normal',
    promisedInDays: 70,
    blockedReason: null,
    notes: '',
    path: [
      { stage: 'Intake', daysAgo: 12, eventId: '5fa04c96-7d3b-4eb5-8c6e-4a9b1d3e5f09' },
      { stage: 'Strip-down', daysAgo: 4, eventId: '5fa04c96-7d3b-4eb5-8c6e-4a9b1d3e5f0a' },
    ],
  },
  {
    id: '4e9f3b85-6c2a-4da4-9b5d-3f8a0c2d4e05',
    pianoId: DEMO_PIANOS[3].id,
    title: 'Assessment and estimate',
    status: 'cancelled',
    priority: 'low',
    promisedInDays: null,
    blockedReason: null,
    notes: 'Assessment only; estimate declined.',
    path: [{ stage: 'Intake', daysAgo: 60, eventId: '5fa04c96-7d3b-4eb5-8c6e-4a9b1d3e5f0b' }],
  },
];

/** A calendar date (YYYY-MM-DD, UTC) `days` from `now`. */
export const demoDate = (now: Date, days: number) => new Date(now.getTime() + days * DAY_MS).toISOString().slice(0, 10);
export const demoInstant = (now: Date, daysAgo: number) => new Date(now.getTime() - daysAgo * DAY_MS);

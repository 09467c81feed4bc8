/**
 * Assessments of the demo scenario (shared/SCENARIO.md): Fennick Cross Piano Works' client terms,
 * its work catalogue (hours are demo defaults from the trade's rough figures, TRADE.md §4), the
 * survey of Harriet Pembleton's grand that her job came from, and the survey of Ines Carvalho's
 * upright whose estimate she declined. Fixed ids keep the seed idempotent.
 */
import { DEMO_JOBS, DEMO_MEMBERS, DEMO_PIANOS } from './demo';
import { DEMO_ESTIMATES, DEMO_PARTS } from './money-demo';

const [GRAND_HAMMERS, , CLOTH, DAMPER_FELTS, WIRE, PINS, SHELLAC] = DEMO_PARTS.map((p) => p.id);
const [, , PRIYA, DECLAN] = DEMO_MEMBERS.map((m) => m.id);
const [SALON_JOB, , , , INES_JOB] = DEMO_JOBS.map((j) => j.id);

export const DEMO_CLIENT_TERMS = {
  address: '12 Market Row\nFennick Cross',
  phone: '01632 960100',
  email: 'office@fennick.example',
  vatNumber: '',
  terms:
    'Prices are ex VAT unless shown with VAT. Work starts once the deposit is received; the balance is due on delivery. Parts found worn once the piano is opened are quoted as a variation before any extra work.',
  depositBasisPoints: 3000,
  linkLifetimeDays: 30,
} as const;

type Line =
  | { kind: 'labour'; description: string; minutes: number }
  | { kind: 'part'; partId: string; description: string; quantityMilli: number }
  | { kind: 'sublet'; description: string; supplier: string; quantityMilli: number; unitPriceMinor: number; unitCostMinor: number };

const opId = (n: number) => `e6c9d04b-7182-4a3b-8c5d-6e7f8091a2${String(n).padStart(2, '0')}`;

export const DEMO_CATALOGUE: Array<{ id: string; name: string; pianoType: 'grand' | 'upright' | null; componentKeys: string[]; lines: Line[] }> = [
  { id: opId(1), name: 'Replace hammer set (grand)', pianoType: 'grand', componentKeys: ['hammers'], lines: [{ kind: 'labour', description: 'Hang, travel and shape new hammers', minutes: 600 }, { kind: 'part', partId: GRAND_HAMMERS!, description: 'Hammer set, grand, 88', quantityMilli: 1000 }, { kind: 'labour', description: 'Voice the new hammers', minutes: 240 }] },
  { id: opId(2), name: 'Rebush keys', pianoType: null, componentKeys: ['key-bushings'], lines: [{ kind: 'labour', description: 'Rebush keys', minutes: 360 }, { kind: 'part', partId: CLOTH!, description: 'Key bushing cloth', quantityMilli: 2500 }] },
  { id: opId(3), name: 'New damper felts', pianoType: 'upright', componentKeys: ['dampers'], lines: [{ kind: 'labour', description: 'Replace and regulate damper felts', minutes: 300 }, { kind: 'part', partId: DAMPER_FELTS!, description: 'Damper felt set, upright', quantityMilli: 1000 }] },
  { id: opId(4), name: 'Full regulation', pianoType: null, componentKeys: ['regulation', 'repetition'], lines: [{ kind: 'labour', description: 'Full regulation', minutes: 600 }] },
  { id: opId(5), name: 'Pitch raise and fine tuning', pianoType: null, componentKeys: ['tuning-pitch'], lines: [{ kind: 'labour', description: 'Pitch raise and fine tuning', minutes: 150 }] },
  { id: opId(6), name: 'Soundboard crack repair', pianoType: null, componentKeys: ['soundboard', 'ribs'], lines: [{ kind: 'labour', description: 'Shim soundboard cracks and reglue ribs', minutes: 480 }] },
  { id: opId(7), name: 'Restring', pianoType: null, componentKeys: ['strings', 'pinblock'], lines: [{ kind: 'labour', description: 'Restring with new tuning pins', minutes: 1350 }, { kind: 'part', partId: WIRE!, description: 'Music wire, plain steel, size 16', quantityMilli: 4000 }, { kind: 'part', partId: PINS!, description: 'Tuning pins, 2/0, blued', quantityMilli: 3000 }] },
  { id: opId(8), name: 'Case tidy', pianoType: null, componentKeys: ['case-finish', 'music-desk', 'lid-hinges'], lines: [{ kind: 'labour', description: 'Clean and revive the shellac, tighten hinges', minutes: 480 }, { kind: 'part', partId: SHELLAC!, description: 'Shellac flakes', quantityMilli: 500 }] },
  { id: opId(9), name: 'Full refinish in black polyester', pianoType: null, componentKeys: ['case-finish'], lines: [{ kind: 'sublet', description: 'Black polyester refinish of the case', supplier: 'Heathside Finishers', quantityMilli: 1000, unitPriceMinor: 185000, unitCostMinor: 145000 }] },
];

export interface DemoAnswer {
  grade?: 'sound' | 'serviceable' | 'needs_work' | 'replace';
  notInspectedReason?: string;
  note?: string;
  a4PitchCentiHz?: number;
  tuningPinTorqueDeciNm?: number;
}

export interface DemoSurvey {
  id: string;
  componentIdPrefix: string;
  pianoId: string;
  jobId: string;
  assessorId: string;
  daysAgo: number;
  place: string;
  pianoType: 'grand' | 'upright';
  isSerialConfirmed: boolean;
  overallGrade: 'needs_work' | 'replace';
  overallCondition: string;
  recommendedWork: string;
  choices: Array<{ choice: string; alternatives: string[] }>;
  /** Answers by component key; components not listed were found sound. */
  answers: Record<string, DemoAnswer>;
}

export const DEMO_SURVEYS: DemoSurvey[] = [
  {
    id: 'f7da15c2-8293-4b4c-9d6e-7f8091a2b301',
    componentIdPrefix: 'f7da15c2-8293-4b4c-9d6e-7f8091a2c3',
    pianoId: DEMO_PIANOS[0].id,
    jobId: SALON_JOB!,
    assessorId: PRIYA!,
    daysAgo: 32,
    place: 'Client’s home, 3 Mill Lane',
    pianoType: 'grand',
    isSerialConfirmed: true,
    overallGrade: 'needs_work',
    overallCondition: 'Structurally sound: soundboard and pinblock are good. The action is worn out and the case finish is tired.',
    recommendedWork: 'New hammers, rebush the keys, full regulation',
    choices: [
      { choice: 'Hammers', alternatives: ['New hammers', 'Recover the old ones'] },
      { choice: 'Case', alternatives: ['Revive the shellac', 'Strip and refinish'] },
    ],
    answers: {
      'case-finish': { grade: 'needs_work', note: 'Shellac crazed and dull; figured rosewood under it is sound.' },
      keytops: { grade: 'serviceable', note: 'Ivory; two chipped in the treble. Keep and clean, do not replace.' },
      'key-bushings': { grade: 'needs_work', note: 'Loose throughout, some moth damage in the front-rail bushings.' },
      hammers: { grade: 'replace', note: 'Grooves about 3 mm deep, felt hard; filed before.' },
      'shanks-flanges': { notInspectedReason: 'Action not removed at the client’s home' },
      repetition: { grade: 'serviceable', note: 'Some springs weak.' },
      pinblock: { grade: 'serviceable', note: 'Even torque across the block.', tuningPinTorqueDeciNm: 113 },
      'tuning-pitch': { grade: 'needs_work', note: 'About 16 cents flat.', a4PitchCentiHz: 43600 },
      regulation: { grade: 'needs_work', note: 'Let-off and drop uneven; key dip deep.' },
    },
  },
  {
    id: 'f7da15c2-8293-4b4c-9d6e-7f8091a2b302',
    componentIdPrefix: 'f7da15c2-8293-4b4c-9d6e-7f8091a2d4',
    pianoId: DEMO_PIANOS[3].id,
    jobId: INES_JOB!,
    assessorId: DECLAN!,
    daysAgo: 62,
    place: 'Client’s home',
    pianoType: 'upright',
    isSerialConfirmed: false,
    overallGrade: 'needs_work',
    overallCondition: 'Playable but tired: hammers worn, bushings loose. Pinblock torque is low.',
    recommendedWork: 'New hammers, rebush, regulation; check the pinblock before any pitch raise',
    choices: [],
    answers: {
      keytops: { grade: 'serviceable', note: 'Ivory, several chipped.' },
      'key-bushings': { grade: 'needs_work', note: 'Loose.' },
      hammers: { grade: 'needs_work', note: 'Worn, moderate grooves.' },
      dampers: { grade: 'serviceable' },
      pinblock: { grade: 'needs_work', note: 'Low torque in the tenor; some pins turn easily.', tuningPinTorqueDeciNm: 51 },
      strings: { grade: 'serviceable', note: 'Light rust in the treble.' },
      'tuning-pitch': { grade: 'needs_work', note: 'Well below pitch.', a4PitchCentiHz: 43100 },
      regulation: { grade: 'needs_work' },
    },
  },
];

/** Ines Carvalho's answer to her estimate, through a link long expired. */
export const DEMO_DECLINE = {
  linkId: 'f7da15c2-8293-4b4c-9d6e-7f8091a2e501',
  responseId: 'f7da15c2-8293-4b4c-9d6e-7f8091a2e502',
  estimateId: DEMO_ESTIMATES.find((e) => e.jobId === INES_JOB && e.status === 'declined')!.id,
  sentTo: 'ines@carvalho.example',
  reason: 'We will wait until next year.',
} as const;

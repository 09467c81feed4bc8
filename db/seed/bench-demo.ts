/**
 * Bench work of the demo scenario (shared/SCENARIO.md): task templates per stage, the jobs'
 * tasks with their technicians, demo PINs and a few past days of time entries. Estimates are demo
 * defaults only (bench hours have no citable source; see TRADE.md §4).
 */
import { DEMO_JOBS, DEMO_MEMBERS } from './demo';

/** Demo wall-screen PINs, printed by the README. */
export const DEMO_PINS = [
  { email: 'priya@fennick.example', pin: '246810' },
  { email: 'declan@fennick.example', pin: '135790' },
  { email: 'ana@fennick.example', pin: '112358' },
] as const;

const [, , PRIYA, DECLAN, ANA] = DEMO_MEMBERS.map((m) => m.id);
const [SALON, CASE, LINWOOD, PARLOUR] = DEMO_JOBS.map((j) => j.id);

interface TemplateItem {
  title: string;
  minutes: number;
}

/** Stage templates by stage name (hours: a grand's hammers ~11 h plus 4 h voicing, regulation ~10 h). */
export const DEMO_TEMPLATES: Record<string, { id: string; items: TemplateItem[] }> = {
  Intake: {
    id: '6ab15da7-8e4c-4fc6-9d7f-5b0c2e4f6a01',
    items: [
      { title: 'Condition notes and photographs', minutes: 60 },
      { title: 'Measure string heights and strike line', minutes: 45 },
    ],
  },
  'Strip-down': {
    id: '6ab15da7-8e4c-4fc6-9d7f-5b0c2e4f6a02',
    items: [
      { title: 'Remove action and keys', minutes: 90 },
      { title: 'Clean key frame and keybed', minutes: 90 },
      { title: 'Bag and label parts', minutes: 45 },
    ],
  },
  Hammers: {
    id: '6ab15da7-8e4c-4fc6-9d7f-5b0c2e4f6a03',
    items: [
      { title: 'Remove old hammers', minutes: 90 },
      { title: 'Hang new hammers', minutes: 360 },
      { title: 'Travel and space', minutes: 150 },
      { title: 'Shape and voice', minutes: 240 },
    ],
  },
  Regulation: {
    id: '6ab15da7-8e4c-4fc6-9d7f-5b0c2e4f6a04',
    items: [
      { title: 'Key height and key dip', minutes: 150 },
      { title: 'Let-off and drop', minutes: 150 },
      { title: 'Repetition springs and hammer check', minutes: 180 },
      { title: 'Damper regulation', minutes: 120 },
    ],
  },
  Finish: {
    id: '6ab15da7-8e4c-4fc6-9d7f-5b0c2e4f6a05',
    items: [
      { title: 'Fine tuning', minutes: 90 },
      { title: 'Clean and polish the case', minutes: 120 },
    ],
  },
};

export interface DemoTask {
  id: string;
  jobId: string;
  stage: string | null;
  title: string;
  status: 'todo' | 'in_progress' | 'done';
  minutes: number | null;
  assignees: string[];
}

const task = (n: number, jobId: string, stage: string | null, title: string, status: DemoTask['status'], minutes: number | null, assignees: string[]): DemoTask => ({
  id: `7bc26eb8-9f5d-4a07-8e80-6c1d3f5a7b${String(n).padStart(2, '0')}`,
  jobId,
  stage,
  title,
  status,
  minutes,
  assignees,
});

/** Each job's tasks in order. */
export const DEMO_TASKS: DemoTask[] = [
  task(1, SALON!, 'Strip-down', 'Remove action and keys', 'done', 90, [PRIYA!]),
  task(2, SALON!, 'Hammers', 'Remove old hammers', 'done', 90, [PRIYA!]),
  task(3, SALON!, 'Hammers', 'Rebush keys', 'in_progress', 300, [PRIYA!]),
  task(4, SALON!, 'Hammers', 'Hang new hammers', 'todo', 360, [PRIYA!]),
  task(5, SALON!, 'Hammers', 'Travel and space', 'todo', 150, [PRIYA!]),
  task(6, SALON!, 'Hammers', 'Shape and voice', 'todo', 240, [PRIYA!]),
  task(7, SALON!, 'Regulation', 'Full regulation', 'todo', 600, [PRIYA!]),
  task(8, SALON!, 'Finish', 'Fine tuning', 'todo', 90, [DECLAN!]),
  task(10, CASE!, 'Intake', 'Test patch: revive the shellac under the lid', 'todo', 90, [ANA!]),
  task(11, LINWOOD!, 'Strip-down', 'Rebush keys (moth damage)', 'done', 240, [PRIYA!]),
  task(12, LINWOOD!, 'Strip-down', 'Fit new damper felts', 'done', 180, [PRIYA!]),
  task(13, LINWOOD!, 'Regulation', 'Regulate the action', 'in_progress', 420, [PRIYA!]),
  task(14, LINWOOD!, 'Regulation', 'Pitch raise', 'todo', 120, [DECLAN!]),
  task(15, LINWOOD!, 'Finish', 'Fine tuning', 'todo', 90, [DECLAN!]),
  task(16, LINWOOD!, 'Finish', 'Clean and polish the case', 'todo', 90, [ANA!]),
  task(20, PARLOUR!, 'Strip-down', 'Remove strings and tuning pins', 'in_progress', 240, [DECLAN!]),
  task(21, PARLOUR!, 'Strip-down', 'Remove action for safe keeping', 'done', 60, [PRIYA!]),
  task(22, PARLOUR!, null, 'Repair the soundboard crack', 'todo', 480, [DECLAN!]),
  task(23, PARLOUR!, null, 'Restring with new tuning pins', 'todo', 1350, [DECLAN!]),
  task(24, PARLOUR!, null, 'Touch up the satin lacquer', 'todo', 180, [ANA!]),
];

export interface DemoEntry {
  id: string;
  technicianId: string;
  taskId: string;
  /** Working days before the seed day (1 = the last weekday before it). */
  workdaysAgo: number;
  /** Local start and end, "HH:mm", in the workshop's time zone. */
  from: string;
  to: string;
  /** Stopped by the bench-day close and waiting for the foreman. */
  needsReview?: boolean;
}

const entry = (n: number, technicianId: string, taskN: number, workdaysAgo: number, from: string, to: string, needsReview = false): DemoEntry => ({
  id: `8cd37fc9-a06e-4b18-9f91-7d2e4a6b8c${String(n).padStart(2, '0')}`,
  technicianId,
  taskId: DEMO_TASKS.find((t) => t.id.endsWith(String(taskN).padStart(2, '0')))!.id,
  workdaysAgo,
  from,
  to,
  needsReview,
});

/** Three past working days at the bench; Declan's last day was left running until the 19:00 close. */
export const DEMO_ENTRIES: DemoEntry[] = [
  entry(1, PRIYA!, 2, 3, '08:00', '10:00'),
  entry(2, PRIYA!, 3, 3, '10:15', '12:30'),
  entry(3, PRIYA!, 13, 3, '13:15', '17:00'),
  entry(4, PRIYA!, 13, 2, '08:00', '12:15'),
  entry(5, PRIYA!, 3, 2, '13:00', '16:45'),
  entry(6, PRIYA!, 13, 1, '08:30', '12:00'),
  entry(10, DECLAN!, 20, 3, '08:00', '12:00'),
  entry(11, DECLAN!, 20, 3, '12:45', '16:30'),
  entry(12, DECLAN!, 20, 2, '09:00', '12:30'),
  entry(13, DECLAN!, 20, 1, '08:00', '19:00', true),
  entry(20, ANA!, 10, 2, '09:30', '11:00'),
];

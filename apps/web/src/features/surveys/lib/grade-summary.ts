import { SURVEY_GRADES, type SurveyGrade } from '@keybed/shared';
import { isAnswered, type ComponentAnswer } from './component-answer';

export interface GradeCounts {
  sound: number;
  serviceable: number;
  needs_work: number;
  replace: number;
  notInspected: number;
  /** Neither graded nor marked not inspected (with its reason) yet. */
  open: number;
}

/** How many components have each grade, how many were not inspected and how many are still open. */
export function gradeCounts(answers: readonly ComponentAnswer[]): GradeCounts {
  const counts: GradeCounts = { sound: 0, serviceable: 0, needs_work: 0, replace: 0, notInspected: 0, open: 0 };
  for (const answer of answers) {
    if (!isAnswered(answer)) counts.open += 1;
    else if (answer.isNotInspected) counts.notInspected += 1;
    else if (answer.grade) counts[answer.grade] += 1;
  }
  return counts;
}

/** The most serious grade given (Replace before Needs work before Serviceable before Sound), or null. */
export function worstGrade(answers: readonly ComponentAnswer[]): SurveyGrade | null {
  const given = new Set(answers.filter((a) => !a.isNotInspected && a.grade).map((a) => a.grade));
  return [...SURVEY_GRADES].reverse().find((grade) => given.has(grade)) ?? null;
}

/** "18 of 22 done" for an area or the whole survey. */
export function progressText(answers: readonly ComponentAnswer[]): string {
  const done = answers.filter(isAnswered).length;
  return `${done} of ${answers.length} done`;
}

/** Names of the components whose grade calls for work, as the estimate will propose them. */
export function needingWork<C extends { name: string }>(items: ReadonlyArray<{ component: C; answer: ComponentAnswer }>): C[] {
  return items.filter(({ answer }) => !answer.isNotInspected && (answer.grade === 'needs_work' || answer.grade === 'replace')).map(({ component }) => component);
}

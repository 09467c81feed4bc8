import type { ReactNode } from 'react';
import { SURVEY_GRADE_LABELS, type SurveyGrade } from '@keybed/shared';
import { cx } from '@/lib/cx';

/**
 * Keybed's grade marks, drawn as a keytop in four states: whole (Sound), chipped at a corner
 * (Serviceable), cracked (Needs work) and broken in two (Replace). Always shown with the word.
 */
export const GRADE_TONES: Record<SurveyGrade, { text: string; pressed: string }> = {
  sound: { text: 'text-felt', pressed: 'bg-felt border-felt text-white' },
  serviceable: { text: 'text-graphite-600', pressed: 'bg-graphite-600 border-graphite-600 text-white' },
  needs_work: { text: 'text-spruce-deep', pressed: 'bg-spruce-deep border-spruce-deep text-white' },
  replace: { text: 'text-damper', pressed: 'bg-damper border-damper text-white' },
};

const SHAPES: Record<SurveyGrade | 'not_inspected', ReactNode> = {
  sound: <rect x="2" y="1.5" width="12" height="17" rx="1.5" fill="currentColor" />,
  serviceable: <path d="M3.5 1.5h6.5l4 4v11.5a1.5 1.5 0 0 1-1.5 1.5h-9A1.5 1.5 0 0 1 2 17V3a1.5 1.5 0 0 1 1.5-1.5z" fill="currentColor" />,
  needs_work: (
    <>
      <rect x="2.75" y="2.25" width="10.5" height="15.5" rx="1.25" fill="none" stroke="currentColor" strokeWidth="1.5" />
      <path d="M8.5 2.5 6.5 7l3 2.5-2.5 5 1 3" fill="none" stroke="currentColor" strokeWidth="1.5" strokeLinejoin="round" />
    </>
  ),
  replace: (
    <>
      <path d="M3.5 1.5h9A1.5 1.5 0 0 1 14 3v4.5L2 10.5V3a1.5 1.5 0 0 1 1.5-1.5z" fill="currentColor" />
      <path d="M2 13.5 14 10.5v7a1.5 1.5 0 0 1-1.5 1.5h-9A1.5 1.5 0 0 1 2 17.5z" fill="currentColor" />
    </>
  ),
  not_inspected: <rect x="2.75" y="2.25" width="10.5" height="15.5" rx="1.25" fill="none" stroke="currentColor" strokeWidth="1.5" strokeDasharray="2.5 2" />,
};

export function GradeMark({ grade, className }: { grade: SurveyGrade | 'not_inspected'; className?: string }) {
  return (
    <svg viewBox="0 0 16 20" aria-hidden="true" className={cx('h-5 w-4 shrink-0', className)}>
      {SHAPES[grade]}
    </svg>
  );
}

/** A grade as a small label: the mark and the word, in the grade's colour. */
export function GradeBadge({ grade, className }: { grade: SurveyGrade; className?: string }) {
  return (
    <span className={cx('inline-flex items-center gap-1.5 rounded border border-current bg-white px-2 py-0.5 text-sm font-semibold', GRADE_TONES[grade].text, className)}>
      <GradeMark grade={grade} className="h-4 w-3.5" />
      {SURVEY_GRADE_LABELS[grade]}
    </span>
  );
}

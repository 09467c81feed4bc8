import { SURVEY_GRADES, SURVEY_GRADE_LABELS, type SurveyGrade } from '@keybed/shared';
import { cx } from '@/lib/cx';
import { GRADE_TONES, GradeMark } from '@/components/grade-mark';

interface GradeButtonsProps {
  /** Names the group for assistive tech, e.g. "Grade for Hammers". */
  label: string;
  grade: SurveyGrade | null;
  onGrade: (grade: SurveyGrade) => void;
  /** Offer "Not inspected" as a fifth toggle (components, not the overall grade). */
  notInspected?: { isPressed: boolean; onToggle: () => void };
}

const base = 'flex min-h-14 min-w-0 flex-1 items-center justify-center gap-2 rounded-md border-2 px-2 text-base font-semibold leading-tight transition-colors';
const unpressed = 'border-graphite-300 bg-white text-ink hover:border-graphite-500';

/** Big toggle buttons, one per grade, sized for a finger on a tablet. Tapping the pressed one clears it. */
export function GradeButtons({ label, grade, onGrade, notInspected }: GradeButtonsProps) {
  return (
    <div role="group" aria-label={label} className="flex flex-wrap gap-2">
      {SURVEY_GRADES.map((g) => {
        const isPressed = grade === g && !notInspected?.isPressed;
        return (
          <button key={g} type="button" aria-pressed={isPressed} onClick={() => onGrade(g)} className={cx(base, 'basis-[calc(50%-0.25rem)] sm:basis-0', isPressed ? GRADE_TONES[g].pressed : unpressed)}>
            <GradeMark grade={g} className={isPressed ? 'text-white' : GRADE_TONES[g].text} />
            {SURVEY_GRADE_LABELS[g]}
          </button>
        );
      })}
      {notInspected && (
        <button
          type="button"
          aria-pressed={notInspected.isPressed}
          onClick={notInspected.onToggle}
          className={cx(base, 'basis-full sm:basis-0', notInspected.isPressed ? 'border-graphite-700 bg-graphite-700 text-white' : unpressed)}
        >
          <GradeMark grade="not_inspected" />
          Not inspected
        </button>
      )}
    </div>
  );
}

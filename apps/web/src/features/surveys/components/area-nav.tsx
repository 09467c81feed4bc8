import type { SurveyArea } from '@keybed/shared';
import type { ComponentAnswer } from '../lib/component-answer';
import { isAnswered } from '../lib/component-answer';
import { cx } from '@/lib/cx';

export const areaAnchor = (index: number) => `area-${index + 1}`;

interface AreaNavProps {
  areas: readonly SurveyArea[];
  answerOf: (componentId: string) => ComponentAnswer | undefined;
}

/** Jump links down the survey, with how much of each area is done. */
export function AreaNav({ areas, answerOf }: AreaNavProps) {
  const link = 'flex min-h-11 items-center justify-between gap-2 rounded-md px-3 py-1 hover:bg-graphite-200';
  return (
    <nav aria-label="Survey sections" className="lg:sticky lg:top-4 lg:self-start">
      <ul className="flex gap-1 overflow-x-auto pb-1 lg:flex-col lg:overflow-visible">
        <li className="shrink-0"><a className={link} href="#particulars">Particulars</a></li>
        {areas.map((area, i) => {
          const done = area.components.filter((c) => { const a = answerOf(c.id); return a ? isAnswered(a) : false; }).length;
          const isComplete = done === area.components.length;
          return (
            <li key={area.area} className="shrink-0">
              <a className={link} href={`#${areaAnchor(i)}`}>
                <span>{area.area}</span>
                <span className={cx('text-sm tabular-figures', isComplete ? 'font-semibold text-felt' : 'text-graphite-600')}>
                  {done}/{area.components.length}
                  <span className="sr-only"> done</span>
                </span>
              </a>
            </li>
          );
        })}
        <li className="shrink-0"><a className={link} href="#summary">Summary</a></li>
      </ul>
    </nav>
  );
}

import { cx } from '@/lib/cx';
import { wipState } from '../lib/wip';

interface StageHeaderProps {
  name: string;
  jobCount: number;
  wipLimit: number | null;
  /** Cards shown when filters hide some; undefined when unfiltered. */
  shownCount?: number | undefined;
}

const jobs = (n: number) => (n === 1 ? '1 job' : `${n} jobs`);

/** Stage name, how many jobs it holds, and its WIP limit; over the limit says so in words. */
export function StageHeader({ name, jobCount, wipLimit, shownCount }: StageHeaderProps) {
  const state = wipState(jobCount, wipLimit);
  return (
    <header className={cx('rounded-t-lg border-b-4 px-3 pt-2 pb-1.5', state === 'over' ? 'border-damper bg-damper-light' : 'border-graphite-300')}>
      <h2 className="text-base leading-tight font-bold">{name}</h2>
      <p className="text-xs text-graphite-700 tabular-figures">
        {jobs(jobCount)}
        {shownCount !== undefined && shownCount !== jobCount && ` · ${shownCount} shown`}
        {state === 'under' && ` · WIP limit ${wipLimit}`}
        {state === 'at' && <span className="font-semibold"> · at WIP limit of {wipLimit}</span>}
        {state === 'over' && <strong className="font-bold text-damper"> · over WIP limit of {wipLimit}</strong>}
      </p>
    </header>
  );
}

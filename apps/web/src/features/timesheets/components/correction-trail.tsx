import type { TimeEntryCorrection } from '@keybed/shared';
import { correctionChanges, localMoment } from '../lib/corrections';

/** Every correction of an entry, oldest first: who, when, what changed and why. */
export function CorrectionTrail({ corrections, timeZone }: { corrections: readonly TimeEntryCorrection[]; timeZone: string }) {
  if (corrections.length === 0) return null;
  return (
    <div className="rounded-md border-l-4 border-spruce bg-spruce-light px-3 py-2 text-sm">
      <h4 className="font-semibold">Corrections</h4>
      <ol className="mt-1 space-y-2">
        {corrections.map((c) => (
          <li key={c.id}>
            <p className="text-graphite-700">
              {c.by?.name ?? 'Someone no longer here'} · <span className="tabular-figures">{localMoment(c.at, timeZone)}</span>
            </p>
            <ul className="tabular-figures">
              {correctionChanges(c, timeZone).map((line) => (
                <li key={line}>{line}</li>
              ))}
            </ul>
            <p>Reason: {c.reason}</p>
          </li>
        ))}
      </ol>
    </div>
  );
}

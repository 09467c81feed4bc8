import type { SafetyCaution } from '@keybed/shared';
import { CautionIcon, cautionLabel } from '@/components/safety-caution';

/**
 * The safety caution for the task a technician is on, large enough to read from the bench: an icon
 * and its one sentence. No link: the wall stays on its own screen; the help page is in the app.
 */
export function WallCautions({ cautions }: { cautions: readonly SafetyCaution[] }) {
  if (cautions.length === 0) return null;
  return (
    <div className="space-y-3">
      {cautions.map((caution) => (
        <div key={caution.id} role="note" aria-label={cautionLabel(caution)} className="flex items-start gap-4 rounded-xl border-2 border-spruce bg-spruce-light px-5 py-4 text-xl text-ink">
          <CautionIcon className="mt-0.5 size-8" />
          <p>{caution.sentence}</p>
        </div>
      ))}
    </div>
  );
}

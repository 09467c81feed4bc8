import { useState } from 'react';
import type { Piano } from '@keybed/shared';
import { Button } from '@/components/button';
import { ErrorState } from '@/components/error-state';
import { Skeleton } from '@/components/skeleton';
import { useLengthUnit } from '@/lib/length-unit';
import { pianoName, pianoShape } from '@/lib/piano';
import { usePianos } from '../api/get-pianos';
import { PianoForm } from './piano-form';

interface PianoPickerProps {
  clientId: string;
  clientName: string;
  selectedId: string | null;
  onSelect: (piano: Piano) => void;
}

/** Choose which of the client's pianos the job is on, or add the piano here. */
export function PianoPicker({ clientId, clientName, selectedId, onSelect }: PianoPickerProps) {
  const unit = useLengthUnit();
  const pianos = usePianos({ clientId });
  const [isAdding, setIsAdding] = useState(false);
  const isEmpty = pianos.data?.length === 0;

  if (isAdding || isEmpty) {
    return (
      <div className="space-y-3">
        <h3 className="font-semibold">New piano for {clientName}</h3>
        <PianoForm
          clientId={clientId}
          onSaved={(piano) => {
            setIsAdding(false);
            onSelect(piano);
          }}
          onCancel={isEmpty ? undefined : () => setIsAdding(false)}
        />
      </div>
    );
  }
  if (pianos.isPending) return <Skeleton className="h-20 w-full" />;
  if (pianos.isError) return <ErrorState error={pianos.error} onRetry={() => void pianos.refetch()} headingLevel="h4" />;

  return (
    <div className="space-y-3">
      <fieldset>
        <legend className="sr-only">Piano</legend>
        <div className="space-y-1">
          {pianos.data.map((piano) => (
            <label key={piano.id} className="flex min-h-11 items-center gap-3 rounded-md px-2 hover:bg-graphite-100 has-checked:bg-spruce-light">
              <input
                type="radio"
                name="pianoId"
                value={piano.id}
                checked={selectedId === piano.id}
                onChange={() => onSelect(piano)}
                className="size-5 accent-walnut"
              />
              <span>
                <span className="font-semibold">{pianoName(piano)}</span>
                <span className="block text-sm text-graphite-600">{pianoShape(piano, unit)}</span>
              </span>
            </label>
          ))}
        </div>
      </fieldset>
      <Button variant="secondary" size="sm" onClick={() => setIsAdding(true)}>
        Add another piano
      </Button>
    </div>
  );
}

import { useState } from 'react';
import type { SurveyComponent } from '@keybed/shared';
import { Button } from '@/components/button';
import { Checkbox } from '@/components/checkbox';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { photoUrl, useRemovePhoto, useSharePhoto } from '../api/photo-actions';
import type { PendingPhoto } from './photo-field';

interface PhotoListProps {
  surveyId: string;
  component: SurveyComponent;
  pending: PendingPhoto[];
  canShare: boolean;
}

/** Thumbnails of a component's photos (full size on tap), and those still uploading with their progress. */
export function PhotoList({ surveyId, component, pending, canShare }: PhotoListProps) {
  const share = useSharePhoto(surveyId);
  const remove = useRemovePhoto(surveyId);
  const [removing, setRemoving] = useState<string | null>(null);
  if (component.photos.length + pending.length === 0) return null;
  return (
    <>
      <ul aria-label={`Photos of ${component.name}`} className="flex flex-wrap gap-3">
        {component.photos.map((photo, i) => {
          const name = `Photo ${i + 1} of ${component.name}`;
          return (
            <li key={photo.id} className="w-36 space-y-1">
              <a href={photoUrl(photo.id, 'web')} target="_blank" rel="noreferrer" className="block overflow-hidden rounded-md border border-graphite-300 bg-graphite-100">
                <img src={photoUrl(photo.id, 'thumb')} alt={name} width={144} height={108} loading="lazy" className="h-27 w-36 object-cover" />
                <span className="sr-only"> (opens full size)</span>
              </a>
              {canShare && (
                <Checkbox
                  isCompact
                  label="Show to the client"
                  aria-label={`Show ${name.toLowerCase()} to the client`}
                  checked={photo.isSharedWithClient}
                  onChange={(e) => share.mutate({ componentId: component.id, photoId: photo.id, isShared: e.target.checked })}
                />
              )}
              <Button size="sm" variant="quiet" className="w-full" onClick={() => setRemoving(photo.id)}>
                Remove<span className="sr-only"> {name.toLowerCase()}</span>
              </Button>
            </li>
          );
        })}
        {pending.map((photo) => (
          <li key={photo.id} className="w-36 space-y-1">
            <img src={photo.previewUrl} alt={`${photo.file.name || 'Photo'}, uploading`} className="h-27 w-36 rounded-md border border-graphite-300 object-cover opacity-70" />
            <progress max={1} value={photo.progress} aria-label={`Uploading ${photo.file.name || 'photo'}`} className="h-2 w-full accent-walnut" />
            <span className="block text-xs text-graphite-600 tabular-figures">{Math.round(photo.progress * 100)} % sent</span>
          </li>
        ))}
      </ul>
      <ConfirmDialog
        isOpen={removing !== null}
        title="Remove this photo?"
        confirmLabel="Remove photo"
        isPending={remove.isPending}
        onCancel={() => setRemoving(null)}
        onConfirm={() => removing && remove.mutate({ componentId: component.id, photoId: removing }, { onSettled: () => setRemoving(null) })}
      >
        <p>The photo is deleted from {component.name}. This cannot be undone.</p>
      </ConfirmDialog>
    </>
  );
}

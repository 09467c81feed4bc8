import { useId, useRef, useState } from 'react';
import type { SurveyComponent } from '@keybed/shared';
import { Alert } from '@/components/alert';
import { Button, buttonClasses } from '@/components/button';
import { isApiError } from '@/lib/api-client';
import { cx } from '@/lib/cx';
import { useAddUploadedPhoto } from '../api/photo-actions';
import { uploadPhoto } from '../api/upload-photo';
import { PhotoList } from './photo-list';

/** A photo on its way up, or one that did not make it. */
export interface PendingPhoto {
  id: string;
  file: File;
  previewUrl: string;
  progress: number;
  /** The API's message for a refused file; or a connection problem, with a retry. */
  failure?: { message: string; canRetry: boolean };
}

interface PhotoFieldProps {
  surveyId: string;
  component: SurveyComponent;
  canShare: boolean;
}

/** Photos from the tablet's camera or files, each uploaded on its own with progress; thumbnails once stored. */
export function PhotoField({ surveyId, component, canShare }: PhotoFieldProps) {
  const inputId = useId();
  const [pending, setPending] = useState<PendingPhoto[]>([]);
  const addUploaded = useAddUploadedPhoto(surveyId);
  const chain = useRef(Promise.resolve());

  const update = (id: string, change: Partial<PendingPhoto>) => setPending((list) => list.map((p) => (p.id === id ? { ...p, ...change } : p)));
  const drop = (photo: PendingPhoto) => {
    URL.revokeObjectURL(photo.previewUrl);
    setPending((list) => list.filter((p) => p.id !== photo.id));
  };

  async function send(photo: PendingPhoto) {
    update(photo.id, { progress: 0, failure: undefined });
    try {
      const upload = await uploadPhoto({ file: photo.file, surveyComponentId: component.id, onProgress: (progress) => update(photo.id, { progress }) });
      addUploaded(upload);
      drop(photo);
    } catch (error) {
      const canRetry = isApiError(error) && ['network_error', 'internal', 'service_unavailable', 'rate_limited'].includes(error.code);
      update(photo.id, { failure: { message: error instanceof Error ? error.message : 'The photo could not be uploaded', canRetry } });
    }
  }

  // One upload at a time per component keeps a slow connection from stalling every photo at once.
  const queue = (photo: PendingPhoto) => (chain.current = chain.current.then(() => send(photo)));

  function onFiles(files: FileList | null) {
    const added = [...(files ?? [])].map((file) => ({ id: crypto.randomUUID(), file, previewUrl: URL.createObjectURL(file), progress: 0 }));
    setPending((list) => [...list, ...added]);
    added.forEach(queue);
  }

  const failures = pending.filter((p) => p.failure);
  return (
    <div className="space-y-2">
      <div className="flex flex-wrap items-center gap-3">
        <input
          id={inputId}
          type="file"
          accept="image/*"
          capture="environment"
          multiple
          className="peer sr-only"
          onChange={(e) => {
            onFiles(e.target.files);
            e.target.value = '';
          }}
        />
        <label htmlFor={inputId} className={cx(buttonClasses('secondary', 'md'), 'cursor-pointer peer-focus-visible:outline-3 peer-focus-visible:outline-spruce-deep peer-focus-visible:outline-offset-2')}>
          <svg viewBox="0 0 20 20" aria-hidden="true" className="size-5">
            <path d="M3 6.5h3l1.5-2h5l1.5 2h3v9H3z" fill="none" stroke="currentColor" strokeWidth="1.5" strokeLinejoin="round" />
            <circle cx="10" cy="11" r="3" fill="none" stroke="currentColor" strokeWidth="1.5" />
          </svg>
          Add photos<span className="sr-only"> of {component.name}</span>
        </label>
        {component.photos.length + pending.length === 0 && <span className="text-sm text-graphite-600">No photos yet</span>}
      </div>
      {failures.map((photo) => (
        <Alert key={photo.id} tone="error" title={`${photo.file.name || 'Photo'} was not added.`}>
          <p>{photo.failure!.message}</p>
          <div className="mt-2 flex gap-2">
            {photo.failure!.canRetry && <Button size="sm" onClick={() => void queue(photo)}>Try again</Button>}
            <Button size="sm" variant="secondary" onClick={() => drop(photo)}>
              Dismiss<span className="sr-only"> the message about {photo.file.name}</span>
            </Button>
          </div>
        </Alert>
      ))}
      <PhotoList surveyId={surveyId} component={component} pending={pending.filter((p) => !p.failure)} canShare={canShare} />
    </div>
  );
}

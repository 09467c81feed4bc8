import { useMutation, useQueryClient } from '@tanstack/react-query';
import { Upload, type Survey, type SurveyPhoto } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { surveyKeys } from './keys';

type PhotoChange = (photos: SurveyPhoto[]) => SurveyPhoto[];

/** Changes one component's photos in the cached survey. */
function usePhotoCache(surveyId: string) {
  const queryClient = useQueryClient();
  return (componentId: string, change: PhotoChange) =>
    queryClient.setQueryData<Survey>(surveyKeys.detail(surveyId), (survey) =>
      survey && {
        ...survey,
        areas: survey.areas.map((area) => ({ ...area, components: area.components.map((c) => (c.id === componentId ? { ...c, photos: change(c.photos) } : c)) })),
      },
    );
}

export const photoUrl = (id: string, size: 'web' | 'thumb') => `/api/uploads/${encodeURIComponent(id)}${size === 'thumb' ? '?size=thumb' : ''}`;

/** A photo that finished uploading joins its component. */
export function useAddUploadedPhoto(surveyId: string) {
  const change = usePhotoCache(surveyId);
  return (upload: Upload) =>
    upload.surveyComponentId &&
    change(upload.surveyComponentId, (photos) => [
      ...photos.filter((p) => p.id !== upload.id),
      { id: upload.id, isSharedWithClient: upload.isSharedWithClient, width: upload.width, height: upload.height, createdAt: upload.createdAt },
    ]);
}

/** Owner and foreman: whether the client sees this photo on their page. Shown at once; undone if refused. */
export function useSharePhoto(surveyId: string) {
  const change = usePhotoCache(surveyId);
  const setShared = (componentId: string, photoId: string, isShared: boolean) =>
    change(componentId, (photos) => photos.map((p) => (p.id === photoId ? { ...p, isSharedWithClient: isShared } : p)));
  return useMutation({
    mutationFn: ({ photoId, isShared }: { componentId: string; photoId: string; isShared: boolean }) =>
      api.patch(`/uploads/${encodeURIComponent(photoId)}`, { isSharedWithClient: isShared }, Upload),
    onMutate: ({ componentId, photoId, isShared }) => setShared(componentId, photoId, isShared),
    onError: (_error, { componentId, photoId, isShared }) => setShared(componentId, photoId, !isShared),
  });
}

export function useRemovePhoto(surveyId: string) {
  const change = usePhotoCache(surveyId);
  return useMutation({
    mutationFn: ({ photoId }: { componentId: string; photoId: string }) => api.delete(`/uploads/${encodeURIComponent(photoId)}`),
    onSuccess: (_nothing, { componentId, photoId }) => change(componentId, (photos) => photos.filter((p) => p.id !== photoId)),
  });
}

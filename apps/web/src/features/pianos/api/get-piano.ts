import { queryOptions, useQuery } from '@tanstack/react-query';
import { PianoDetail } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { pianoKeys } from './keys';

export const getPiano = (id: string) => api.get(`/pianos/${encodeURIComponent(id)}`, PianoDetail);

export const pianoQueryOptions = (id: string) => queryOptions({ queryKey: pianoKeys.detail(id), queryFn: () => getPiano(id) });

export const usePiano = (id: string) => useQuery(pianoQueryOptions(id));

import { useMutation } from '@tanstack/react-query';
import { WallPairing, type PairWallInput } from '@keybed/shared';
import { api } from '@/lib/api-client';

/** Turns this browser into the wall screen; the API signs the member out here and sets the device cookie. */
export const pairWall = (input: PairWallInput) => api.post('/wall/pair', input, WallPairing);

export const usePairWall = () => useMutation({ mutationFn: pairWall, meta: { handlesError: true } });

import { useMemo } from 'react';
import { useQuery } from '@tanstack/react-query';
import { marginsQueryOptions } from '../api/get-margins';
import type { CardFigures } from '../components/card-indicators';

/**
 * Hours and forecast margin for every board card from one request: the owner's margins report for
 * the year so far (a job on the board is open today, so it is in it). Other roles have no batched
 * source yet, so their cards show nothing rather than asking once per card.
 */
export function useCardFigures(isOwner: boolean): Map<string, CardFigures> {
  const report = useQuery({ ...marginsQueryOptions({}), enabled: isOwner, staleTime: 60_000 });
  return useMemo(
    () =>
      new Map(
        (report.data?.rows ?? []).map((row) => [
          row.jobId,
          {
            estimatedMinutes: row.estimatedMinutes,
            actualMinutes: row.actualMinutes,
            forecastMarginPercent: row.priceMinor > 0 ? row.forecastMarginPercent : null,
            isBelowTargetMargin: row.isBelowTargetMargin,
          },
        ]),
      ),
    [report.data],
  );
}

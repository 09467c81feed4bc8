import { useMemo } from 'react';
import { useQuery } from '@tanstack/react-query';
import { marginsQueryOptions } from '../api/get-margins';
import type { CardMarginFigures } from '../components/card-indicators';

/**
 * The owner's forecast margin for every board card from one request: the margins report for the
 * year so far (a job on the board is open today, so it is in it). Hours come with the board itself.
 */
export function useCardMargins(isOwner: boolean): Map<string, CardMarginFigures> {
  const report = useQuery({ ...marginsQueryOptions({}), enabled: isOwner, staleTime: 60_000 });
  return useMemo(
    () =>
      new Map(
        (report.data?.rows ?? []).map((row) => [
          row.jobId,
          { forecastMarginPercent: row.priceMinor > 0 ? row.forecastMarginPercent : null, isBelowTargetMargin: row.isBelowTargetMargin },
        ]),
      ),
    [report.data],
  );
}

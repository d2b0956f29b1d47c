import type { FillCardOptions } from '@loftwright/buoyancy';
import type { FillCardQuery, VersionDetail } from '@loftwright/contract';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import { dispositionFileName, saveBlob } from '@/lib/save-blob';

export type { FillCardAnswer, FillCardQuery } from '@loftwright/contract';

/**
 * GET /api/calculations/:id/versions/:n: the card is computed in the browser from the version's
 * inputs as the crew types, with the engine the server uses (no request per keystroke).
 */
export const fillCardVersionQueryOptions = (calculationId: string, versionNumber: number) =>
  queryOptions({
    queryKey: ['fill-card', 'version', calculationId, versionNumber],
    queryFn: async () =>
      (
        await apiClient.get<VersionDetail>(
          `/calculations/${calculationId}/versions/${versionNumber}`,
        )
      ).data,
    // A saved version never changes.
    staleTime: Infinity,
  });

export const useFillCardVersion = (calculationId: string, versionNumber: number) =>
  useQuery(fillCardVersionQueryOptions(calculationId, versionNumber));

/** The card's typed values as the API's query (SI numbers; absent ones left out). */
export function fillCardQuery(options: FillCardOptions): Partial<FillCardQuery> {
  const cylinder = options.cylinder;
  return {
    fillerMassKg: options.fillerMassKg,
    freeLiftKg: options.freeLiftKg,
    cylinderWaterVolumeM3: cylinder?.waterVolumeM3,
    cylinderFillPressurePa: cylinder?.fillPressurePa,
    cylinderTemperatureK: cylinder?.temperatureK,
    cylinderCount: cylinder?.count,
  };
}

/** GET .../fill-card.pdf: the server's one-page card, saved by the browser. */
export async function downloadFillCardPdf(
  calculationId: string,
  versionNumber: number,
  options: FillCardOptions,
): Promise<void> {
  const response = await apiClient.get<Blob>(
    `/calculations/${calculationId}/versions/${versionNumber}/fill-card.pdf`,
    { params: fillCardQuery(options), responseType: 'blob' },
  );
  const header = response.headers['content-disposition'] as string | undefined;
  saveBlob(response.data, dispositionFileName(header, `fill-card-v${versionNumber}.pdf`));
}

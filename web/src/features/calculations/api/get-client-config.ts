import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ClientConfig, MapTilesConfig } from '@loftwright/contract';
import { apiClient } from '@/lib/api-client';

export type { ClientConfig, MapTilesConfig } from '@loftwright/contract';

/**
 * GET /api/client-config. A server older than the endpoint, or one answering something else,
 * means no tiles rather than a broken chart.
 */
export async function getClientConfig(): Promise<ClientConfig> {
  const answer = (await apiClient.get<Partial<ClientConfig> | undefined>('/client-config')).data;
  const mapTiles = answer?.mapTiles;
  return { mapTiles: isMapTiles(mapTiles) ? mapTiles : null };
}

function isMapTiles(value: unknown): value is MapTilesConfig {
  const tiles = value as Partial<MapTilesConfig> | null | undefined;
  return typeof tiles?.urlTemplate === 'string' && typeof tiles.attribution === 'string';
}

/** A deployment's settings change only with a restart: read once per page load. */
export const getClientConfigQueryOptions = () =>
  queryOptions({
    queryKey: ['client-config'],
    queryFn: getClientConfig,
    staleTime: Number.POSITIVE_INFINITY,
  });

/**
 * The base map's tile server: null when none is configured (or the settings could not be read),
 * undefined while they are being read. Asked for only when `enabled` (a chart that can use it).
 */
export function useMapTiles(enabled: boolean): MapTilesConfig | null | undefined {
  const { data, isError } = useQuery({ ...getClientConfigQueryOptions(), enabled });
  if (data) return data.mapTiles;
  return isError || !enabled ? null : undefined;
}

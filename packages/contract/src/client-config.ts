/**
 * A base map's tile server, as a deployment configures it (MAP_TILE_URL, MAP_TILE_ATTRIBUTION).
 * `urlTemplate` holds `{z}`, `{x}` and `{y}` in the usual slippy-map order; the attribution is
 * the text the provider requires beside its tiles.
 */
export interface MapTilesConfig {
  urlTemplate: string;
  attribution: string;
}

/**
 * GET /api/client-config (public): what a deployment tells the web app before sign-in. No map
 * tiles unless the deployment configured a tile server.
 */
export interface ClientConfig {
  mapTiles: MapTilesConfig | null;
}

import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { ClientConfig } from '@loftwright/contract';
import type { EnvironmentVariables } from '../config/env.validation';

@Injectable()
export class ClientConfigService {
  constructor(private readonly config: ConfigService<EnvironmentVariables, true>) {}

  /** The deployment's settings the web app needs: today only the base map's tile server. */
  read(): ClientConfig {
    const urlTemplate = this.config.get('MAP_TILE_URL', { infer: true });
    const attribution = this.config.get('MAP_TILE_ATTRIBUTION', { infer: true });
    // The environment check makes the attribution required with the address.
    return { mapTiles: urlTemplate && attribution ? { urlTemplate, attribution } : null };
  }
}

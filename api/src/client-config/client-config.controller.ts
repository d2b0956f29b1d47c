import { Controller, Get } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { ClientConfig } from '@loftwright/contract';
import { Public } from '../common/decorators/public.decorator';
import { ClientConfigService } from './client-config.service';

@ApiTags('client-config')
@Controller('client-config')
export class ClientConfigController {
  constructor(private readonly clientConfig: ClientConfigService) {}

  /** What this deployment tells the web app; public, as it holds nothing private. */
  @Public()
  @Get()
  read(): ClientConfig {
    return this.clientConfig.read();
  }
}

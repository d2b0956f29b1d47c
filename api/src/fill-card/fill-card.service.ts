import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { fillCard, InputError, KINDS } from '@loftwright/buoyancy';
import type { FillCardAnswer } from '@loftwright/contract';
import type { AuthUser } from '../auth/auth-user';
import { CalculationsService } from '../calculations/calculations.service';
import { publicBaseUrl, verifyUrl } from '../common/public-url';
import type { EnvironmentVariables } from '../config/env.validation';
import type { FillCardQueryDto } from './dto/fill-card-query.dto';
import { fillCardOptions, inQueryNames } from './fill-card-options';

/**
 * The crew's fill card of a saved version, recomputed with the engine from the version's inputs
 * (never from stored results), for whoever may read the version.
 */
@Injectable()
export class FillCardService {
  constructor(
    private readonly calculations: CalculationsService,
    private readonly config: ConfigService<EnvironmentVariables, true>,
  ) {}

  async card(
    user: AuthUser,
    id: string,
    number: number,
    query: FillCardQueryDto,
    origin: string,
  ): Promise<FillCardAnswer> {
    const calculation = await this.calculations.findReadable(user, id);
    const version = await this.calculations.findVersion(id, number);
    let card: FillCardAnswer['card'];
    try {
      card = fillCard(calculation.kind, version.inputs, fillCardOptions(query));
    } catch (error) {
      throw error instanceof InputError ? inQueryNames(error) : error;
    }
    const baseUrl = publicBaseUrl(this.config.get('PUBLIC_URL', { infer: true }), origin);
    return {
      calculationId: calculation.id,
      title: calculation.title,
      kind: calculation.kind,
      kindTitle: KINDS.find((kind) => kind.id === calculation.kind)?.title ?? calculation.kind,
      versionNumber: version.number,
      fingerprint: version.fingerprint,
      engineVersion: version.engineVersion,
      verifyUrl: verifyUrl(baseUrl, version.fingerprint),
      card,
    };
  }
}

import {
  BadRequestException,
  type CanActivate,
  type ExecutionContext,
  ForbiddenException,
  Injectable,
} from '@nestjs/common';
import type { Request } from 'express';
import type { AuthUser } from '../auth/auth-user';
import { canAddFiles } from '../calculations/calculation-access';
import { CalculationsService } from '../calculations/calculations.service';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/**
 * Decides who may upload to a calculation before a byte of the body is read (guards run before
 * the upload interceptor): a calculation the user cannot see is a 404, one they cannot change a
 * 403, and neither costs the server the upload.
 */
@Injectable()
export class UploadAccessGuard implements CanActivate {
  constructor(private readonly calculations: CalculationsService) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const request = context.switchToHttp().getRequest<Request & { user: AuthUser }>();
    const id = request.params.id;
    if (typeof id !== 'string' || !UUID.test(id)) {
      throw new BadRequestException({ message: 'id must be a UUID', field: 'id' });
    }
    const calculation = await this.calculations.findReadable(request.user, id);
    if (!canAddFiles(request.user, calculation)) {
      throw new ForbiddenException({
        message: 'Only the calculation’s owner or an admin adds files to it.',
      });
    }
    return true;
  }
}

import type { Account } from '@loftwright/contract';
import { Body, Controller, Get, Param, Patch } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { uuidParam } from '../common/pipes/uuid-param.pipe';
import { UpdateRolesDto } from './dto/update-roles.dto';
import { toPublicUser } from './user.entity';
import { UsersService } from './users.service';

@ApiTags('admin')
@ApiBearerAuth()
@Controller('admin/users')
@Roles('admin')
export class AdminUsersController {
  constructor(private readonly usersService: UsersService) {}

  @Get()
  async list(): Promise<Account[]> {
    return (await this.usersService.list()).map(toPublicUser);
  }

  @Patch(':id')
  async updateRoles(
    @CurrentUser() actor: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Body() body: UpdateRolesDto,
  ): Promise<Account> {
    return toPublicUser(await this.usersService.updateRoles(actor.id, id, body.roles));
  }
}

import type { ClassDetail, ClassSummary } from '@loftwright/contract';
import { RateLimited } from '../common/rate-limit';
import { Body, Controller, Delete, Get, HttpCode, HttpStatus, Param, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { uuidParam } from '../common/pipes/uuid-param.pipe';
import { ClassroomsService } from './classrooms.service';
import { CreateClassroomDto, JoinClassroomDto, RenewJoinCodeDto } from './dto/classroom.dto';

@ApiTags('classes')
@ApiBearerAuth()
@Controller('classes')
export class ClassroomsController {
  constructor(private readonly classrooms: ClassroomsService) {}

  /** Classes the user teaches or has joined (every class, for an admin). */
  @Get()
  list(@CurrentUser() user: AuthUser): Promise<ClassSummary[]> {
    return this.classrooms.list(user);
  }

  @Post()
  create(@CurrentUser() user: AuthUser, @Body() body: CreateClassroomDto): Promise<ClassDetail> {
    return this.classrooms.create(user, body);
  }

  /** A student joins with the code the teacher handed out. */
  @RateLimited('class-join')
  @Post('join')
  @HttpCode(HttpStatus.OK)
  join(@CurrentUser() user: AuthUser, @Body() body: JoinClassroomDto): Promise<ClassDetail> {
    return this.classrooms.join(user, body.code);
  }

  @Get(':id')
  detail(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
  ): Promise<ClassDetail> {
    return this.classrooms.detail(user, id);
  }

  /** A fresh join code; the old one stops working at once. */
  @Post(':id/join-code')
  @HttpCode(HttpStatus.OK)
  renewCode(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Body() body: RenewJoinCodeDto,
  ): Promise<ClassDetail> {
    return this.classrooms.renewCode(user, id, body.joinCodeValidDays);
  }

  @Post(':id/close')
  @HttpCode(HttpStatus.OK)
  close(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
  ): Promise<ClassDetail> {
    return this.classrooms.close(user, id);
  }

  @Delete(':id/students/:userId')
  @HttpCode(HttpStatus.NO_CONTENT)
  removeStudent(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Param('userId', uuidParam('userId')) userId: string,
  ): Promise<void> {
    return this.classrooms.removeStudent(user, id, userId);
  }
}

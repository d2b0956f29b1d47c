import type { ClassroomStanding, ClassDetail, ClassSummary } from '@loftwright/contract';
import { configuredBaseUrl } from '../common/public-url';
import {
  ConflictException,
  ForbiddenException,
  GoneException,
  Injectable,
  NotFoundException,
} from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectRepository } from '@nestjs/typeorm';
import { randomUUID } from 'node:crypto';
import { In, Repository } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import { type AuthUser, hasRole } from '../auth/auth-user';
import type { EnvironmentVariables } from '../config/env.validation';
import { insertRow } from '../persistence/insert-row';
import { WriteLock } from '../persistence/write-lock';
import { UsersService } from '../users/users.service';
import { ClassroomMember } from './classroom-member.entity';
import { Classroom } from './classroom.entity';
import type { CreateClassroomDto } from './dto/classroom.dto';
import { formatJoinCode, JOIN_CODE_LENGTH, newJoinCode, normaliseJoinCode } from './join-code';

const DAY_MS = 86_400_000;
const DEFAULT_JOIN_DAYS = 14;

/** How a user stands towards a class: runs it, sits in it, or neither. */
export type { ClassroomStanding } from '@loftwright/contract';

/** Teacher-only actions on a class and what is published to it: a student gets 403. */
export function requireTeaching(standing: ClassroomStanding): void {
  if (standing === 'student') {
    throw new ForbiddenException({ message: 'Only the class teacher may do this.' });
  }
}

/**
 * Worked examples go to a class that is open, from someone teaching it (its teacher, or an admin
 * who also teaches) who holds the teacher role.
 */
export function mayPublishTo(
  user: AuthUser,
  classroom: Pick<Classroom, 'closedAt'>,
  standing: ClassroomStanding,
): boolean {
  return standing !== 'student' && hasRole(user, 'teacher') && classroom.closedAt === null;
}

@Injectable()
export class ClassroomsService {
  constructor(
    @InjectRepository(Classroom) private readonly classrooms: Repository<Classroom>,
    @InjectRepository(ClassroomMember) private readonly members: Repository<ClassroomMember>,
    private readonly users: UsersService,
    private readonly audit: AuditService,
    private readonly writeLock: WriteLock,
    private readonly config: ConfigService<EnvironmentVariables, true>,
  ) {}

  private joinUrl(code: string): string {
    return `${configuredBaseUrl(this.config)}/join/${code}`;
  }

  private summary(classroom: Classroom, standing: ClassroomStanding, studentCount: number) {
    const teacherView = standing !== 'student';
    return {
      id: classroom.id,
      title: classroom.title,
      teacherId: classroom.teacherId,
      closed: classroom.closedAt !== null,
      closedAt: classroom.closedAt ? new Date(classroom.closedAt).toISOString() : null,
      createdAt: new Date(classroom.createdAt).toISOString(),
      standing,
      studentCount,
      // Students do not need the code; handing it on is the teacher's decision.
      ...(teacherView
        ? {
            joinCode: formatJoinCode(classroom.joinCode),
            joinUrl: this.joinUrl(classroom.joinCode),
            joinCodeExpiresAt: new Date(classroom.joinCodeExpiresAt).toISOString(),
          }
        : {}),
    };
  }

  /** The class and how the user stands towards it; 404 when the user may not see it at all. */
  async findVisible(
    user: AuthUser,
    id: string,
  ): Promise<{ classroom: Classroom; standing: ClassroomStanding }> {
    const classroom = await this.classrooms.findOneBy({ id });
    if (classroom) {
      if (classroom.teacherId === user.id) return { classroom, standing: 'teacher' };
      if (hasRole(user, 'admin')) return { classroom, standing: 'admin' };
      if (await this.members.existsBy({ classroomId: id, studentId: user.id })) {
        return { classroom, standing: 'student' };
      }
    }
    throw new NotFoundException({
      message: 'This class does not exist or you are not in it.',
      field: 'id',
    });
  }

  /** The class, for its teacher or an admin; others get the same 404 as for a missing class. */
  async findTaught(user: AuthUser, id: string): Promise<Classroom> {
    const { classroom, standing } = await this.findVisible(user, id);
    requireTeaching(standing);
    return classroom;
  }

  async isMember(classroomId: string, studentId: string): Promise<boolean> {
    return this.members.existsBy({ classroomId, studentId });
  }

  private async counts(ids: string[]): Promise<Map<string, number>> {
    if (ids.length === 0) return new Map();
    const rows = await this.members
      .createQueryBuilder('member')
      .select('member.classroom_id', 'id')
      .addSelect('COUNT(*)', 'count')
      .where({ classroomId: In(ids) })
      .groupBy('member.classroom_id')
      .getRawMany<{ id: string; count: number }>();
    return new Map(rows.map((row) => [row.id, Number(row.count)]));
  }

  async list(user: AuthUser): Promise<ClassSummary[]> {
    const memberships = await this.members.findBy({ studentId: user.id });
    const joinedIds = memberships.map((member) => member.classroomId);
    const rows = await this.classrooms.find({
      where: hasRole(user, 'admin')
        ? {}
        : [{ teacherId: user.id }, ...(joinedIds.length ? [{ id: In(joinedIds) }] : [])],
      order: { createdAt: 'DESC' },
    });
    const counts = await this.counts(rows.map((row) => row.id));
    return rows.map((row) =>
      this.summary(
        row,
        row.teacherId === user.id ? 'teacher' : joinedIds.includes(row.id) ? 'student' : 'admin',
        counts.get(row.id) ?? 0,
      ),
    );
  }

  async detail(user: AuthUser, id: string): Promise<ClassDetail> {
    const { classroom, standing } = await this.findVisible(user, id);
    const members = await this.members.find({
      where: { classroomId: id },
      order: { joinedAt: 'ASC' },
    });
    const teacher = await this.users.findById(classroom.teacherId);
    const base = {
      ...this.summary(classroom, standing, members.length),
      teacher: { id: classroom.teacherId, displayName: teacher?.displayName ?? 'unknown user' },
      permissions: { publish: mayPublishTo(user, classroom, standing) },
    };
    if (standing === 'student') return base;
    const names = await this.users.names(members.map((member) => member.studentId));
    return {
      ...base,
      students: members.map((member) => ({
        id: member.studentId,
        displayName: names(member.studentId)?.displayName ?? 'unknown user',
        joinedAt: new Date(member.joinedAt).toISOString(),
      })),
    };
  }

  async create(user: AuthUser, dto: CreateClassroomDto): Promise<ClassDetail> {
    if (!hasRole(user, 'teacher')) {
      throw new ForbiddenException({ message: 'Running a class needs the teacher role.' });
    }
    const id = randomUUID();
    await this.writeLock.transaction(async (manager) => {
      await insertRow(manager.getRepository(Classroom), {
        id,
        teacherId: user.id,
        title: dto.title.trim(),
        joinCode: await this.unusedCode(),
        joinCodeExpiresAt: new Date(
          Date.now() + (dto.joinCodeValidDays ?? DEFAULT_JOIN_DAYS) * DAY_MS,
        ),
        closedAt: null,
      });
      await this.audit.record(
        { actorId: user.id, action: 'classroom.create', targetType: 'classroom', targetId: id },
        manager,
      );
    });
    return this.detail(user, id);
  }

  private async unusedCode(): Promise<string> {
    for (;;) {
      const code = newJoinCode();
      if (!(await this.classrooms.existsBy({ joinCode: code }))) return code;
    }
  }

  async renewCode(user: AuthUser, id: string, validDays = DEFAULT_JOIN_DAYS): Promise<ClassDetail> {
    const classroom = await this.findTaught(user, id);
    if (classroom.closedAt) {
      throw new ConflictException({ message: 'The class is closed.', field: 'id' });
    }
    await this.writeLock.transaction(async (manager) => {
      await manager.getRepository(Classroom).update(
        { id },
        {
          joinCode: await this.unusedCode(),
          joinCodeExpiresAt: new Date(Date.now() + validDays * DAY_MS),
        },
      );
      await this.audit.record(
        { actorId: user.id, action: 'classroom.renew-code', targetType: 'classroom', targetId: id },
        manager,
      );
    });
    return this.detail(user, id);
  }

  /**
   * The class a join code admits a student to now. A wrong code is 404, a code past its date 410,
   * a closed class 409; each names the field (`code`, or `joinCode` at registration) so the form
   * can say what to do.
   */
  async findJoinable(rawCode: string, field = 'code'): Promise<Classroom> {
    const code = normaliseJoinCode(rawCode);
    const classroom =
      code.length === JOIN_CODE_LENGTH ? await this.classrooms.findOneBy({ joinCode: code }) : null;
    if (!classroom) {
      throw new NotFoundException({
        message: 'No class has this join code. Check it with your teacher.',
        field,
      });
    }
    if (classroom.closedAt) {
      throw new ConflictException({
        message: 'This class is closed and takes no new students.',
        field,
      });
    }
    if (new Date(classroom.joinCodeExpiresAt).getTime() < Date.now()) {
      throw new GoneException({
        message: 'This join code has expired. Ask your teacher for a new one.',
        field,
      });
    }
    return classroom;
  }

  /** Puts a student on the roster of the class the code belongs to (once). */
  async join(user: AuthUser, rawCode: string): Promise<ClassDetail> {
    if (!hasRole(user, 'student')) {
      throw new ForbiddenException({
        message: 'Joining a class needs a student account; teachers open their classes directly.',
      });
    }
    const classroom = await this.findJoinable(rawCode);
    const already = await this.isMember(classroom.id, user.id);
    if (!already) {
      await this.writeLock.transaction(async (manager) => {
        await manager
          .getRepository(ClassroomMember)
          .createQueryBuilder()
          .insert()
          .values({ classroomId: classroom.id, studentId: user.id })
          .orIgnore()
          .execute();
        await this.audit.record(
          {
            actorId: user.id,
            action: 'classroom.join',
            targetType: 'classroom',
            targetId: classroom.id,
          },
          manager,
        );
      });
    }
    return this.detail(user, classroom.id);
  }

  async removeStudent(user: AuthUser, id: string, studentId: string): Promise<void> {
    await this.findTaught(user, id);
    await this.writeLock.transaction(async (manager) => {
      const result = await manager
        .getRepository(ClassroomMember)
        .delete({ classroomId: id, studentId });
      if (!result.affected) {
        throw new NotFoundException({
          message: 'This student is not in the class.',
          field: 'userId',
        });
      }
      await this.audit.record(
        {
          actorId: user.id,
          action: 'classroom.remove-student',
          targetType: 'classroom',
          targetId: id,
          detail: { studentId },
        },
        manager,
      );
    });
  }

  async close(user: AuthUser, id: string): Promise<ClassDetail> {
    const classroom = await this.findTaught(user, id);
    if (!classroom.closedAt) {
      await this.writeLock.transaction(async (manager) => {
        await manager.getRepository(Classroom).update({ id }, { closedAt: new Date() });
        await this.audit.record(
          { actorId: user.id, action: 'classroom.close', targetType: 'classroom', targetId: id },
          manager,
        );
      });
    }
    return this.detail(user, id);
  }

  /** Test and seed hook: moves a code's expiry, as time passing would. */
  async setCodeExpiry(id: string, expiresAt: Date): Promise<void> {
    await this.writeLock.run(() =>
      this.classrooms.update({ id }, { joinCodeExpiresAt: expiresAt }),
    );
  }
}

import { Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { AuthUser } from '../auth/auth-user';
import { CalculationsService } from '../calculations/calculations.service';
import type { EnvironmentVariables } from '../config/env.validation';
import { ReviewsService } from '../reviews/reviews.service';
import { UsersService } from '../users/users.service';
import { FillLogsService } from '../fill-logs/fill-logs.service';
import { PlansService } from '../plans/plans.service';
import { ClassroomsService } from '../classrooms/classrooms.service';
import { WorkedExamplesService } from '../worked-examples/worked-examples.service';
import {
  DEMO_ACCOUNTS,
  DEMO_CALCULATIONS,
  DEMO_CLASSROOM,
  DEMO_FILL_LOGS,
  DEMO_PLANS,
} from './demo-scenario';

/** 127.0.0.0/8, ::1 and "localhost": addresses only this machine can reach. */
export function isLoopbackHost(host: string): boolean {
  const bare = host
    .trim()
    .toLowerCase()
    .replace(/^\[|\]$/g, '');
  return bare === 'localhost' || bare === '::1' || /^127(\.\d{1,3}){3}$/.test(bare);
}

/**
 * Fills an empty database with the demo accounts and scenario, through the same services the API
 * uses, so every stored result is a real engine result. SEED_DEMO=0 turns it off; unset, it runs
 * only when the server listens on loopback.
 */
@Injectable()
export class DemoSeedService implements OnApplicationBootstrap {
  private readonly logger = new Logger('DemoSeed');

  constructor(
    private readonly config: ConfigService<EnvironmentVariables, true>,
    private readonly usersService: UsersService,
    private readonly calculationsService: CalculationsService,
    private readonly reviewsService: ReviewsService,
    private readonly fillLogsService: FillLogsService,
    private readonly plansService: PlansService,
    private readonly classroomsService: ClassroomsService,
    private readonly examplesService: WorkedExamplesService,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    const setting = this.config.get('SEED_DEMO', { infer: true });
    const host = this.config.get('HOST', { infer: true });
    const onLoopback = isLoopbackHost(host);
    if (setting === '0') return;
    if (setting === undefined && !onLoopback) {
      this.logger.log(
        `No demo accounts: the server listens on ${host}, not only on this machine. Set SEED_DEMO=1 to create them anyway.`,
      );
      return;
    }
    if ((await this.usersService.count()) > 0) return;
    if (!onLoopback) {
      this.logger.warn(
        `DEMO ACCOUNTS WITH THE PUBLISHED PASSWORD ARE BEING CREATED ON A SERVER LISTENING ON ${host}. Anyone who can reach it can sign in as the demo admin. Unset SEED_DEMO (or set SEED_DEMO=0) and start from an empty database for real use.`,
      );
    }
    await this.seed();
  }

  async seed(): Promise<void> {
    const password = this.config.get('DEMO_PASSWORD', { infer: true });
    const people = new Map<string, AuthUser>();
    for (const account of DEMO_ACCOUNTS) {
      const user = await this.usersService.create({ ...account, password });
      people.set(account.key, {
        id: user.id,
        email: user.email,
        displayName: user.displayName,
        roles: user.roles,
      });
    }
    const reviewer = people.get('reviewer') as AuthUser;
    const ids = new Map<string, string>();
    for (const demo of DEMO_CALCULATIONS) {
      const owner = people.get(demo.owner) as AuthUser;
      const [first, ...later] = demo.versions;
      if (!first) continue;
      const created = await this.calculationsService.create(owner, {
        title: demo.title,
        kind: demo.kind,
        inputs: first.inputs,
        visibility: demo.visibility,
        tags: demo.tags,
        note: first.note,
      });
      ids.set(demo.title, created.id);
      let number = 1;
      for (const version of later) {
        await this.calculationsService.saveVersion(owner, created.id, {
          baseVersion: number,
          inputs: version.inputs,
          note: version.note,
        });
        number += 1;
      }
      if (demo.stage === 'draft') continue;
      // No request here: links on the demo's sheets name the address the server listens on.
      const origin = `http://localhost:${this.config.get('PORT', { infer: true })}`;
      await this.reviewsService.submit(owner, created.id, number, undefined);
      if (demo.stage === 'approved')
        await this.reviewsService.approve(
          reviewer,
          created.id,
          number,
          demo.reviewComment ?? '',
          origin,
        );
      if (demo.stage === 'changes_requested')
        await this.reviewsService.sendBack(
          reviewer,
          created.id,
          number,
          demo.reviewComment ?? 'Please revise.',
          origin,
        );
    }
    const designer = people.get('designer') as AuthUser;
    for (const log of DEMO_FILL_LOGS) {
      const { calculationTitle, ...fill } = log;
      await this.fillLogsService.create(designer, ids.get(calculationTitle) ?? '', 1, {
        ...fill,
        readings: fill.readings.map((reading) => ({ ...reading })),
      });
    }
    for (const plan of DEMO_PLANS) {
      await this.plansService.create(designer, {
        ...plan,
        lines: plan.lines.map((line) =>
          'calculationTitle' in line
            ? { calculationId: ids.get(line.calculationTitle), count: line.count }
            : { ...line },
        ),
        fill: { ...plan.fill },
        electrolyser: { ...plan.electrolyser },
        cylinder: { ...plan.cylinder },
        prices: { ...plan.prices },
      });
    }
    const teacher = people.get('teacher') as AuthUser;
    const classroom = await this.classroomsService.create(teacher, {
      title: DEMO_CLASSROOM.title,
      joinCodeValidDays: 365,
    });
    for (const example of DEMO_CLASSROOM.examples) {
      const { calculationTitle, exercise, stepNotes, tryRanges, ...words } = example;
      await this.examplesService.publish(teacher, classroom.id, {
        ...words,
        calculationId: ids.get(calculationTitle) ?? '',
        versionNumber: 1,
        stepNotes: { ...stepNotes },
        tryRanges: Object.fromEntries(
          Object.entries(tryRanges).map(([path, range]) => [path, { ...range }]),
        ),
        exercise: exercise ? { ...exercise, hiddenOutputs: [...exercise.hiddenOutputs] } : null,
      });
    }
    const student = people.get('student') as AuthUser;
    await this.classroomsService.join(student, classroom.joinCode ?? '');
    this.logger.log(
      `Demo data added: ${DEMO_ACCOUNTS.length} accounts (password from DEMO_PASSWORD), ${DEMO_CALCULATIONS.length} calculations, ${DEMO_FILL_LOGS.length} fill log, ${DEMO_PLANS.length} gas plan, 1 class with ${DEMO_CLASSROOM.examples.length} worked examples`,
    );
  }
}

import type { CalculationDetail } from '@loftwright/contract';
import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { InputError } from '@loftwright/buoyancy';
import { Repository } from 'typeorm';
import type { AuthUser } from '../auth/auth-user';
import { UsersService } from '../users/users.service';
import { calculationFile, type CalculationFile } from './calculation-file';
import { CalculationVersion } from './calculation-version.entity';
import { CalculationsService } from './calculations.service';
import type { ImportCalculationDto } from './dto/import-calculation.dto';
import { computeVersionContent, inBodyField } from './version-content';

/** Calculations to and from Loftwright's own JSON file. */
@Injectable()
export class CalculationTransferService {
  constructor(
    private readonly calculations: CalculationsService,
    @InjectRepository(CalculationVersion) private readonly versions: Repository<CalculationVersion>,
    private readonly users: UsersService,
  ) {}

  async export(user: AuthUser, id: string): Promise<CalculationFile> {
    const calculation = await this.calculations.findReadable(user, id);
    const versions = await this.versions.find({
      where: { calculationId: id },
      order: { number: 'ASC' },
    });
    const names = await this.users.names(versions.map((version) => version.authorId));
    return calculationFile(
      calculation,
      versions,
      (authorId) => names(authorId)?.displayName ?? 'unknown user',
    );
  }

  /**
   * A new calculation owned by the importer, with one draft version per version in the file, in
   * order. Every version's inputs are checked by the engine before anything is created, so a bad
   * file leaves nothing behind.
   */
  async import(user: AuthUser, file: ImportCalculationDto): Promise<CalculationDetail> {
    for (const [index, version] of file.versions.entries()) {
      // One version's engine run at a time, then other requests get their turn.
      await yieldToOtherRequests();
      inBodyField(`versions.${index}.inputs`, () => {
        try {
          computeVersionContent(file.calculation.kind, version.inputs);
        } catch (error) {
          // computeVersionContent names fields under "inputs"; the file nests them one deeper.
          if (!(error instanceof InputError)) throw error;
          throw new InputError(
            error.issues.map((issue) => ({
              ...issue,
              field: issue.field.replace(/^inputs\.?/, '') || '(inputs)',
            })),
          );
        }
      });
    }
    const ordered = [...file.versions].sort((a, b) => a.number - b.number);
    const importedFrom = (number: number) => `Imported from a Loftwright file (version ${number})`;
    const [first, ...rest] = ordered;
    if (!first) throw new Error('unreachable: the DTO requires a version');
    const created = await this.calculations.create(user, {
      title: file.calculation.title,
      kind: file.calculation.kind,
      inputs: first.inputs,
      tags: file.calculation.tags ?? [],
      note: first.note
        ? `${first.note} — ${importedFrom(first.number)}`
        : importedFrom(first.number),
    });
    let base = 1;
    for (const version of rest) {
      await yieldToOtherRequests();
      await this.calculations.saveVersion(user, created.id, {
        baseVersion: base,
        inputs: version.inputs,
        note: version.note
          ? `${version.note} — ${importedFrom(version.number)}`
          : importedFrom(version.number),
      });
      base += 1;
    }
    return this.calculations.detail(user, created.id);
  }
}

/** Lets the event loop serve what is waiting (a health check, another user) before going on. */
function yieldToOtherRequests(): Promise<void> {
  return new Promise((resolve) => setImmediate(resolve));
}

import type { CalculationDetail, CalculationSource } from '@loftwright/contract';
import { UnprocessableEntityException } from '@nestjs/common';
import { continuations, needsLeft } from '@loftwright/buoyancy';
import type { Repository } from 'typeorm';
import type { AuthUser } from '../auth/auth-user';
import { accountPermissions } from '../users/account-permissions';
import { canRead } from './calculation-access';
import type { Calculation } from './calculation.entity';

/**
 * Where a calculation came from, what continues from it, and what the reader may continue it
 * into, as the reader may see them. A source
 * the reader may not open is shown without id, title or newest version (they learn only that the
 * inputs were taken from a calculation of that kind); continuations they may not open are left
 * out, so nothing of others' private work shows.
 */
export async function readLinks(
  calculations: Repository<Calculation>,
  user: AuthUser,
  calculation: Calculation,
): Promise<Pick<CalculationDetail, 'source' | 'continuations' | 'continueAs'>> {
  const continued = await calculations.find({
    where: { sourceCalculationId: calculation.id },
    order: { createdAt: 'ASC' },
  });
  return {
    source: await readSource(calculations, user, calculation),
    continuations: continued
      .filter((item) => canRead(user, item))
      .map((item) => ({ id: item.id, title: item.title, kind: item.kind })),
    continueAs: accountPermissions(user.roles).createCalculations
      ? continuations(calculation.kind).map((target) => ({ ...target }))
      : [],
  };
}

async function readSource(
  calculations: Repository<Calculation>,
  user: AuthUser,
  calculation: Calculation,
): Promise<CalculationSource | null> {
  if (!calculation.sourceCalculationId || calculation.sourceVersionNumber === null) return null;
  const source = await calculations.findOneBy({ id: calculation.sourceCalculationId });
  const visible = source !== null && canRead(user, source);
  return {
    calculationId: visible ? source.id : null,
    title: visible ? source.title : null,
    kind: source?.kind ?? '',
    versionNumber: calculation.sourceVersionNumber,
    newestVersionNumber: visible ? source.latestVersion : null,
    needs: calculation.sourceNeeds ?? [],
  };
}

/**
 * The link columns a save changes: the source version named by "Take version N" (checked: this
 * calculation has a source the saver may read, and the version exists), and the paths still to
 * fill, less those the save changed.
 */
export async function sourceChangesOnSave(
  calculations: Repository<Calculation>,
  user: AuthUser,
  calculation: Calculation,
  save: { sourceVersion?: number; previousInputs: unknown; savedInputs: unknown },
): Promise<Partial<Calculation>> {
  const changes: Partial<Calculation> = {};
  if (calculation.sourceNeeds && calculation.sourceNeeds.length > 0) {
    changes.sourceNeeds = needsLeft(calculation.sourceNeeds, save.previousInputs, save.savedInputs);
  }
  if (save.sourceVersion === undefined) return changes;
  const source = calculation.sourceCalculationId
    ? await calculations.findOneBy({ id: calculation.sourceCalculationId })
    : null;
  if (!source || !canRead(user, source)) {
    throw new UnprocessableEntityException({
      message: 'Source version: this calculation was not continued from one you may open.',
      field: 'sourceVersion',
    });
  }
  if (save.sourceVersion > source.latestVersion) {
    throw new UnprocessableEntityException({
      message: `Source version: “${source.title}” has versions 1 to ${source.latestVersion}, not ${save.sourceVersion}.`,
      field: 'sourceVersion',
    });
  }
  changes.sourceVersionNumber = save.sourceVersion;
  return changes;
}

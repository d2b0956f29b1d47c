import type { CalculationSummary, VersionDetail, VersionSummary } from '@loftwright/contract';
import type { CalculationVersion } from './calculation-version.entity';
import type { Calculation } from './calculation.entity';

import type { NameLookup } from '../users/user-ref';

export type { NameLookup, UserRef } from '../users/user-ref';

export function calculationSummary(
  calculation: Calculation,
  names: NameLookup,
): CalculationSummary {
  return {
    id: calculation.id,
    title: calculation.title,
    kind: calculation.kind,
    owner: names(calculation.ownerId),
    visibility: calculation.visibility,
    tags: calculation.tags,
    latestVersion: calculation.latestVersion,
    status: calculation.latestStatus,
    archived: calculation.archivedAt !== null,
    createdAt: new Date(calculation.createdAt).toISOString(),
    updatedAt: new Date(calculation.updatedAt).toISOString(),
  };
}

export function versionSummary(version: CalculationVersion, names: NameLookup): VersionSummary {
  return {
    number: version.number,
    status: version.status,
    note: version.note,
    author: names(version.authorId),
    reviewer: names(version.reviewerId),
    engineVersion: version.engineVersion,
    fingerprint: version.fingerprint,
    createdAt: new Date(version.createdAt).toISOString(),
    submittedAt: version.submittedAt ? new Date(version.submittedAt).toISOString() : null,
  };
}

export function versionDetail(version: CalculationVersion, names: NameLookup): VersionDetail {
  return {
    ...versionSummary(version, names),
    inputs: version.inputs,
    outputs: version.outputs,
    steps: version.steps,
    warnings: version.warnings,
    series: version.series,
  };
}

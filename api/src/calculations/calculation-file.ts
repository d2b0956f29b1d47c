import { ENGINE_VERSION } from '@loftwright/buoyancy';
import type { CalculationVersion } from './calculation-version.entity';
import type { Calculation } from './calculation.entity';

/** Loftwright's own file for one calculation and its history (docs/file-format.md). */
export const CALCULATION_FILE_FORMAT = 'loftwright.calculation';
export const CALCULATION_FILE_VERSION = 1;

export interface CalculationFile {
  format: typeof CALCULATION_FILE_FORMAT;
  formatVersion: typeof CALCULATION_FILE_VERSION;
  exportedAt: string;
  engineVersion: string;
  calculation: { title: string; kind: string; tags: string[] };
  versions: {
    number: number;
    note: string;
    author: string;
    createdAt: string;
    status: string;
    engineVersion: string;
    fingerprint: string;
    inputs: unknown;
    outputs: unknown;
  }[];
}

/**
 * A calculation as a file: its inputs (what an import uses) and, for a reader's benefit, the
 * results and fingerprints they had here. Approvals are not carried: a sign-off belongs to the
 * team that gave it.
 */
export function calculationFile(
  calculation: Calculation,
  versions: CalculationVersion[],
  authorName: (id: string) => string,
): CalculationFile {
  return {
    format: CALCULATION_FILE_FORMAT,
    formatVersion: CALCULATION_FILE_VERSION,
    exportedAt: new Date().toISOString(),
    engineVersion: ENGINE_VERSION,
    calculation: { title: calculation.title, kind: calculation.kind, tags: calculation.tags },
    versions: versions.map((version) => ({
      number: version.number,
      note: version.note,
      author: authorName(version.authorId),
      createdAt: version.createdAt.toISOString(),
      status: version.status,
      engineVersion: version.engineVersion,
      fingerprint: version.fingerprint,
      inputs: version.inputs,
      outputs: version.outputs,
    })),
  };
}

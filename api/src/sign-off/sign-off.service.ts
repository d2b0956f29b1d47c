import { Injectable, Logger } from '@nestjs/common';
import {
  describeInputs,
  KINDS,
  type LiftSweep,
  liftSweeps,
  type ReadableOptions,
} from '@loftwright/buoyancy';
import { AttachmentsService } from '../attachments/attachments.service';
import type { AttachmentView } from '../attachments/attachment-views';
import type { CalculationVersion } from '../calculations/calculation-version.entity';
import type { Calculation } from '../calculations/calculation.entity';
import { renderSignOffPdf, type SignOffContent } from './sign-off-pdf';

/** File name of an archived sheet: the title's letters and digits, the version. */
export const sheetFileName = (title: string, number: number): string =>
  `${
    title
      .replace(/[^\p{L}\p{N}]+/gu, '-')
      .replace(/^-|-$/g, '')
      .slice(0, 80) || 'calculation'
  }-v${number}-sign-off.pdf`;

/**
 * How the archived sheet writes numbers: SI and 1,234.5, the reading anyone can check against the
 * engine's stored values. (The web sheet uses each reader's own preferences.)
 */
const SHEET_READING: ReadableOptions = { unitSystem: 'si', numberFormat: 'point-comma' };

/**
 * Archives the sign-off sheet of an approved version as a PDF attachment of its calculation, so
 * the signed record survives whatever the web page or engine later become.
 */
@Injectable()
export class SignOffService {
  private readonly logger = new Logger('SignOffService');

  constructor(private readonly attachments: AttachmentsService) {}

  async archiveApproved(
    calculation: Calculation,
    version: CalculationVersion,
    people: { author: string; reviewerId: string; reviewer: string },
    comment: string,
    decidedAt: Date,
    verifyUrl: string,
    approverTimeZone?: string,
  ): Promise<{ attachment: AttachmentView; bytes: Buffer } | undefined> {
    const content: SignOffContent = {
      title: calculation.title,
      kindTitle: KINDS.find((kind) => kind.id === calculation.kind)?.title ?? calculation.kind,
      versionNumber: version.number,
      status: 'approved',
      fingerprint: version.fingerprint,
      engineVersion: version.engineVersion,
      author: people.author,
      savedAt: version.createdAt,
      note: version.note,
      inputs: version.inputs,
      outputs: version.outputs,
      steps: version.steps,
      warnings: version.warnings,
      review: {
        reviewer: people.reviewer,
        decidedAt,
        comment,
        ...(approverTimeZone ? { timeZone: approverTimeZone } : {}),
      },
      verifyUrl,
      inputSections: describeInputs(
        KINDS.find((kind) => kind.id === calculation.kind)?.inputSchema,
        version.inputs,
        SHEET_READING,
      ),
      charts: this.charts(calculation.kind, version),
      reading: SHEET_READING,
    };
    try {
      const bytes = await renderSignOffPdf(content);
      const attachment = await this.attachments.storeGenerated(
        people.reviewerId,
        calculation.id,
        bytes,
        {
          fileName: sheetFileName(calculation.title, version.number),
          mediaType: 'application/pdf',
          versionNumber: version.number,
        },
      );
      return { attachment, bytes };
    } catch (error) {
      // The approval has been recorded already; a sheet that failed to render must not undo it.
      this.logger.error(
        `Could not archive the sign-off sheet of ${calculation.id} v${version.number}: ${String(error)}`,
      );
      return undefined;
    }
  }

  /**
   * The lift sweeps the kind charts (engine capabilities), from the version's inputs and stored
   * results. They illustrate the sheet; if they cannot be drawn the sheet goes without them.
   */
  private charts(kind: string, version: CalculationVersion): LiftSweep[] {
    try {
      return liftSweeps(kind, version.inputs, version.outputs);
    } catch (error) {
      this.logger.warn(`No charts on the sheet of ${kind} v${version.number}: ${String(error)}`);
      return [];
    }
  }
}

import { InputError, type InputIssue, type LandingArea, landingArea } from '@loftwright/buoyancy';

/** What the page asks the worker: a landing area for these flight-profile inputs. */
export interface LandingAreaRequest {
  readonly id: number;
  readonly inputs: unknown;
}

/** What the worker answers; an InputError travels as its issues (a class does not cross). */
export type LandingAreaAnswer =
  | { readonly id: number; readonly status: 'done'; readonly area: LandingArea }
  | { readonly id: number; readonly status: 'refused'; readonly issues: readonly InputIssue[] }
  | { readonly id: number; readonly status: 'failed'; readonly message: string };

/**
 * Runs the engine's landing area for one request. The worker calls it off the main thread; it is
 * kept apart from the worker so that it can be run and tested anywhere.
 */
export function runLandingAreaJob(request: LandingAreaRequest): LandingAreaAnswer {
  try {
    // The runs, seed and spreads come from the inputs' own landingArea settings.
    const area = landingArea(request.inputs as Parameters<typeof landingArea>[0]);
    return { id: request.id, status: 'done', area };
  } catch (error) {
    if (error instanceof InputError) {
      return {
        id: request.id,
        status: 'refused',
        issues: error.issues.map(({ field, value, reason, range }) => ({
          field,
          value,
          reason,
          ...(range ? { range } : {}),
        })),
      };
    }
    return {
      id: request.id,
      status: 'failed',
      message: error instanceof Error ? error.message : String(error),
    };
  }
}

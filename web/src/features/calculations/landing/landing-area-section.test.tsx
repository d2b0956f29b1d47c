import { act, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { KINDS } from '@loftwright/buoyancy';
import { describe, expect, it } from 'vitest';
import { renderWithProviders } from '@/testing/test-utils';
import { runLandingAreaJob } from './landing-area-job';
import { LandingAreaSection } from './landing-area-section';
import { type LandingWorker, useLandingArea } from './use-landing-area';

const flightKind = KINDS.find((kind) => kind.id === 'flight-profile');
const schema = flightKind?.inputSchema ?? {};

/** The kind's example in a steady 10 m/s westerly, from a site at 52° N when `site`. */
function windyFlight(site: boolean) {
  const example = flightKind?.example as Record<string, unknown>;
  const launch = example.launch as Record<string, unknown>;
  return {
    ...example,
    launch: site ? { ...launch, latitudeDeg: 52, longitudeDeg: 0 } : launch,
    wind: {
      layers: [
        { heightM: 0, directionDeg: 270, speedMS: 10 },
        { heightM: 40000, directionDeg: 270, speedMS: 10 },
      ],
    },
    landingArea: { runs: 20, seed: 7 },
  };
}

/** Answers the page workers were asked for and have not given yet. */
let held: (() => void)[] = [];

/**
 * The worker's own job run in the page (jsdom has no workers): it answers on a later task, as a
 * worker does, or when the test lets it (`hold`), and never once terminated.
 */
function pageWorker(hold = false): LandingWorker {
  let ended = false;
  const worker: LandingWorker = {
    onmessage: null,
    onerror: null,
    postMessage: (request) => {
      const answer = () => {
        if (!ended) worker.onmessage?.({ data: runLandingAreaJob(request) } as MessageEvent);
      };
      if (hold) held.push(answer);
      else setTimeout(answer);
    },
    terminate: () => {
      ended = true;
    },
  };
  return worker;
}

const heldWorker = () => pageWorker(true);

function Harness({ inputs, hold = false }: { inputs: unknown; hold?: boolean }) {
  const landing = useLandingArea(inputs, schema, 'si', hold ? heldWorker : pageWorker);
  return <LandingAreaSection landing={landing} inputs={inputs} />;
}

describe('LandingAreaSection', () => {
  it('shows the run count and default spreads, estimates when pressed', async () => {
    const user = userEvent.setup();
    renderWithProviders(<Harness inputs={windyFlight(true)} />);
    // The spreads are the engine's defaults (common practice, no published source).
    expect(
      screen.getByText(/^20 repeated flights, .*burst diameter 7 %, ascent rate 5 %/),
    ).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Estimate landing area' }));
    expect(await screen.findByText(/^Landing area from 20 runs/)).toBeInTheDocument();
    // A wind from one direction varied only in speed scatters the runs along a line: the engine
    // says the regions were widened, and the page shows it.
    expect(screen.getByText(/scatter along a line .* regions are widened/)).toBeInTheDocument();
  });

  it('can be cancelled while the runs fly', async () => {
    const user = userEvent.setup();
    held = [];
    renderWithProviders(<Harness inputs={windyFlight(true)} hold />);
    await user.click(screen.getByRole('button', { name: 'Estimate landing area' }));
    expect(screen.getByText('Flying 20 runs…')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Cancel' }));
    expect(screen.queryByText('Flying 20 runs…')).not.toBeInTheDocument();
    // The ended worker's answer is dropped: no area is reported.
    act(() => held.forEach((answer) => answer()));
    expect(held).toHaveLength(1);
    expect(screen.queryByText(/^Landing area from/)).not.toBeInTheDocument();
  });

  it('names the field the estimate waits for by its label', async () => {
    const user = userEvent.setup();
    renderWithProviders(<Harness inputs={windyFlight(false)} />);
    await user.click(screen.getByRole('button', { name: 'Estimate landing area' }));
    expect(
      await screen.findByText(/^The landing area waits for: Latitude of the launch site/i),
    ).toBeInTheDocument();
  });
});

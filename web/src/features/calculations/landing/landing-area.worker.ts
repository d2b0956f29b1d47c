import { type LandingAreaRequest, runLandingAreaJob } from './landing-area-job';

// A module worker: the repeated flights take seconds, so they run here and the page stays
// responsive (and can stop them by ending the worker).
const scope = globalThis as unknown as {
  onmessage: ((event: MessageEvent<LandingAreaRequest>) => void) | null;
  postMessage: (message: unknown) => void;
};

scope.onmessage = (event) => {
  scope.postMessage(runLandingAreaJob(event.data));
};

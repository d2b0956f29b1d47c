import '@testing-library/jest-dom/vitest';
import { cleanup, configure } from '@testing-library/react';
import { afterEach, vi } from 'vitest';

// jsdom has neither; antd's Grid and Table need both.
Object.defineProperty(window, 'matchMedia', {
  writable: true,
  value: vi.fn().mockImplementation((query: string) => ({
    matches: false,
    media: query,
    onchange: null,
    addListener: vi.fn(),
    removeListener: vi.fn(),
    addEventListener: vi.fn(),
    removeEventListener: vi.fn(),
    dispatchEvent: vi.fn(),
  })),
});

class ResizeObserverStandIn {
  observe(): void {}
  unobserve(): void {}
  disconnect(): void {}
}
globalThis.ResizeObserver = ResizeObserverStandIn as unknown as typeof ResizeObserver;

// findBy… and waitFor wait 1 s by default: too short for a lazily loaded route or antd's first
// render on a busy 2-core machine. They return as soon as what they wait for is there.
configure({ asyncUtilTimeout: 10_000 });

afterEach(() => cleanup());

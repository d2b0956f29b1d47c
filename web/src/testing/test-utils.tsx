import { render } from '@testing-library/react';
import type { ReactElement } from 'react';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { AppProvider } from '@/app/provider';
import { routes } from '@/app/router';

/** Renders the real routes in the real providers at `url`, as the browser would. */
export function renderApp(url: string) {
  const router = createMemoryRouter(routes, { initialEntries: [url] });
  return {
    router,
    ...render(
      <AppProvider>
        <RouterProvider router={router} />
      </AppProvider>,
    ),
  };
}

export function renderWithProviders(ui: ReactElement) {
  return render(<AppProvider>{ui}</AppProvider>);
}

/** Renders one element as the only route of a memory data router, in the real providers. */
export function renderInRouter(element: ReactElement) {
  const router = createMemoryRouter([{ path: '/', element }]);
  return render(
    <AppProvider>
      <RouterProvider router={router} />
    </AppProvider>,
  );
}

import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen, waitFor } from '@testing-library/react';
import { createMemoryRouter, Link, Outlet, RouterProvider } from 'react-router-dom';
import { PageHeader } from './page-header';
import { FocusOnNavigate } from './route-focus';

function renderRoutes() {
  const router = createMemoryRouter(
    [
      {
        element: (
          <>
            <FocusOnNavigate />
            <nav>
              <Link to="/customers">Customers</Link> <Link to="/customers?q=oak">Search</Link>
            </nav>
            <main>
              <Outlet />
            </main>
          </>
        ),
        children: [
          { path: '/', element: <PageHeader title="Today" /> },
          { path: '/customers', element: <PageHeader title="Customers" /> },
        ],
      },
    ],
    { initialEntries: ['/'] },
  );
  render(<RouterProvider router={router} />);
}

describe('moving between pages', () => {
  it('names the tab after the page and moves focus to its heading', async () => {
    renderRoutes();
    await waitFor(() => expect(document.title).toBe('Today · Seamwright'));
    // The first page leaves focus to the browser.
    expect(document.activeElement).toBe(document.body);

    const link = screen.getByRole('link', { name: 'Customers' });
    link.focus();
    fireEvent.click(link);

    const heading = await screen.findByRole('heading', { level: 1, name: 'Customers' });
    await waitFor(() => expect(document.activeElement).toBe(heading));
    expect(document.title).toBe('Customers · Seamwright');
    expect(heading.getAttribute('tabindex')).toBe('-1');
  });

  it('keeps focus where it is when only the query string changes', async () => {
    renderRoutes();
    fireEvent.click(screen.getByRole('link', { name: 'Customers' }));
    await screen.findByRole('heading', { level: 1, name: 'Customers' });
    const search = screen.getByRole('link', { name: 'Search' });
    search.focus();
    fireEvent.click(search);
    await new Promise((resolve) => setTimeout(resolve, 20));
    expect(document.activeElement).toBe(search);
  });
});

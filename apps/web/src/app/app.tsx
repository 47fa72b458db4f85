import { useState } from 'react';
import { createBrowserRouter } from 'react-router';
import { RouterProvider } from 'react-router/dom';
import { queryClientCreate } from '../lib/react-query';
import { AppProvider } from './provider';
import { appRoutes } from './router';

/**
 * The whole web app: providers around the browser router.
 * @returns the app element
 * @example createRoot(el).render(<App />)
 */
export function App() {
  const [queryClient] = useState(queryClientCreate);
  const [router] = useState(() => createBrowserRouter(appRoutes(queryClient)));
  return (
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>
  );
}

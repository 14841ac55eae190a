import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { RouterProvider } from 'react-router/dom';
import { wireApiClient } from './app/api-wiring';
import { AppProviders } from './app/providers';
import { createAppRouter } from './app/router';
import { queryClient } from './lib/query-client';
import './index.css';

const router = createAppRouter(queryClient);
wireApiClient(router, queryClient);

const root = document.getElementById('root');
if (!root) throw new Error('index.html lost its #root element');

createRoot(root).render(
  <StrictMode>
    <AppProviders queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProviders>
  </StrictMode>,
);

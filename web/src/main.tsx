import './theme/fonts.js';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { RouterProvider } from 'react-router-dom';
import { AppProviders } from './app/providers.js';
import { createQueryClient } from './app/query-client.js';
import { registerServiceWorker } from './app/register-service-worker.js';
import { createAppRouter } from './app/router.js';

registerServiceWorker();
const queryClient = createQueryClient();
const router = createAppRouter(queryClient);
const rootElement = document.getElementById('root');
if (!rootElement) throw new Error('index.html has no #root element.');

createRoot(rootElement).render(
  <StrictMode>
    <AppProviders queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProviders>
  </StrictMode>,
);

import { useState } from 'react';
import { RouterProvider } from 'react-router-dom';
import { createQueryClient } from '@/lib/react-query';
import { AppProvider } from './provider';
import { createAppRouter } from './router';

export function App() {
  const [queryClient] = useState(() => createQueryClient());
  const [router] = useState(() => createAppRouter(queryClient));
  return (
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>
  );
}

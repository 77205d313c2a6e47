import { useState } from 'react';
import { RouterProvider } from 'react-router/dom';
import { AppProvider } from '@/app/provider';
import { createRouter } from '@/app/router';

export function App() {
  const [router] = useState(createRouter);
  return (
    <AppProvider>
      <RouterProvider router={router} />
    </AppProvider>
  );
}

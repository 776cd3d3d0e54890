import { useState } from 'react';
import { FluentProvider } from '@fluentui/react-components';
import { QueryClientProvider } from '@tanstack/react-query';
import { RouterProvider } from 'react-router-dom';
import { createQueryClient } from './query-client';
import { router } from './router';
import { useSessionLanguage } from './session-language';
import { mantlepieceTheme } from './theme';
import './i18n';

function Routes() {
  useSessionLanguage();
  return <RouterProvider router={router} />;
}

export function App() {
  const [queryClient] = useState(createQueryClient);
  return (
    <QueryClientProvider client={queryClient}>
      <FluentProvider theme={mantlepieceTheme}>
        <Routes />
      </FluentProvider>
    </QueryClientProvider>
  );
}

import { useState } from 'react';
import { FluentProvider } from '@fluentui/react-components';
import { QueryClientProvider } from '@tanstack/react-query';
import { languageDirection } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { RouterProvider } from 'react-router-dom';
import { createQueryClient } from './query-client';
import { router } from './router';
import { useSessionLanguage } from './session-language';
import { mantlepieceTheme } from './theme';

function Routes() {
  useSessionLanguage();
  return <RouterProvider router={router} />;
}

export function App() {
  const [queryClient] = useState(createQueryClient);
  const { i18n } = useTranslation();
  // Fluent mirrors its own components (and flips icons made to flip) from the provider's dir.
  return (
    <QueryClientProvider client={queryClient}>
      <FluentProvider theme={mantlepieceTheme} dir={languageDirection(i18n.resolvedLanguage ?? i18n.language)}>
        <Routes />
      </FluentProvider>
    </QueryClientProvider>
  );
}

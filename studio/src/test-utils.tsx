import type { ReactElement } from 'react';
import { FluentProvider } from '@fluentui/react-components';
import { QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import { MemoryRouter } from 'react-router-dom';
import { i18next } from './app/i18n';
import { createQueryClient } from './app/query-client';
import { mantlepieceTheme } from './app/theme';

/** Renders a piece of the studio with everything it gets in the real app: theme, i18n, router, queries. */
export async function renderInStudio(ui: ReactElement, { language = 'en' }: { language?: string } = {}) {
  await i18next.changeLanguage(language);
  return render(
    <QueryClientProvider client={createQueryClient()}>
      <FluentProvider theme={mantlepieceTheme}>
        <MemoryRouter>{ui}</MemoryRouter>
      </FluentProvider>
    </QueryClientProvider>,
  );
}

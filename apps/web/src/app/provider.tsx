// Core styles for every screen; the dates, charts, dropzone and notifications styles load with the code that uses them.
import '@mantine/core/styles.css';
import './fonts.css';
import { MantineProvider } from '@mantine/core';
import { QueryClientProvider } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { queryClient } from '../lib/query-client';
import { NotificationsHost } from './notifications-host';
import { cssVariablesResolver, theme } from './theme';

export function AppProvider({ children }: { children: ReactNode }) {
  return (
    <MantineProvider theme={theme} cssVariablesResolver={cssVariablesResolver} defaultColorScheme="light">
      <NotificationsHost />
      <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>
    </MantineProvider>
  );
}

import '@/styles/radix.css';
import '@/styles/fonts.css';
import '@/styles/theme.css';
import { Theme } from '@radix-ui/themes';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { Toaster } from '@/components/ui/toaster';

export function AppProvider({
  queryClient,
  children,
}: {
  queryClient: QueryClient;
  children: ReactNode;
}) {
  return (
    <QueryClientProvider client={queryClient}>
      <Theme accentColor="jade" grayColor="sage" radius="medium" panelBackground="solid">
        <Toaster>{children}</Toaster>
      </Theme>
    </QueryClientProvider>
  );
}

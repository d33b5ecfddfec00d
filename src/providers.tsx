import { QueryClientProvider, type QueryClient } from "@tanstack/react-query";
import type { ReactNode } from "react";
import { Toaster } from "@/components/ui/toaster/toaster.tsx";
import { DeferredConnectionBanners } from "@/features/offline/deferred-connection-banners.tsx";

export function AppProviders({ queryClient, children }: { queryClient: QueryClient; children: ReactNode }) {
  return (
    <QueryClientProvider client={queryClient}>
      <DeferredConnectionBanners />
      {children}
      <Toaster />
    </QueryClientProvider>
  );
}

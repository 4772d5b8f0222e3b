"use client";
import { isServer, QueryClient, QueryClientProvider } from "@tanstack/react-query";

function makeQueryClient() {
  return new QueryClient({ defaultOptions: { queries: { staleTime: 30_000, refetchOnWindowFocus: false } } });
}

let browserClient: QueryClient | undefined;

/**
 * The QueryClient: a fresh one for every server render (no data shared between requests), one per
 * browser tab otherwise, so every subtree that uses TanStack Query shares one cache.
 */
export function getQueryClient(): QueryClient {
  if (isServer) return makeQueryClient();
  browserClient ??= makeQueryClient();
  return browserClient;
}

/**
 * TanStack Query for the subtree that uses it (the pieces table, the generate screen). Kept out of
 * the root layout so pages without queries do not load it.
 */
export function QueryProvider({ children }: { children: React.ReactNode }) {
  return <QueryClientProvider client={getQueryClient()}>{children}</QueryClientProvider>;
}

"use client";
// react-query for every call the browser makes to the API (components/api/request-json.ts), set up
// once for all signed-in pages in app/(app)/layout.tsx.
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { useState, type ReactNode } from "react";

export function QueryProvider({ children }: { children: ReactNode }) {
  // Mutations are never retried: a save that failed is shown, not repeated behind the user's back.
  const [client] = useState(
    () =>
      new QueryClient({ defaultOptions: { queries: { staleTime: 10_000, retry: 1 }, mutations: { retry: false } } }),
  );
  return <QueryClientProvider client={client}>{children}</QueryClientProvider>;
}

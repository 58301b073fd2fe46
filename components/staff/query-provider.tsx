"use client";

import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { useState, type ReactNode } from "react";
import { DeskApiError } from "@/components/desk/api";

function makeClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 10_000,
        refetchOnWindowFocus: true,
        // A refusal (401, 403, 404, 409, 400) will not change by asking again; a dropped connection or a 5xx may.
        retry: (failures, error) => failures < 2 && !(error instanceof DeskApiError && error.status < 500),
      },
      mutations: { retry: false },
    },
  });
}

/** One query cache per browser tab for the staff screens that read the desk's JSON API. */
export function QueryProvider({ children }: { children: ReactNode }) {
  const [client] = useState(makeClient);
  return <QueryClientProvider client={client}>{children}</QueryClientProvider>;
}

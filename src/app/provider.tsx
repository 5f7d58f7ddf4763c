import { useEffect, useState, type ReactNode } from "react";
import { QueryClientProvider, type QueryClient } from "@tanstack/react-query";
import { Toaster } from "../components/ui/toaster";
import { meQueryOptions } from "../features/auth/api/get-me";
import { createQueryClient, startOnlineState } from "../lib/query-client";
import { startOutbox } from "./outbox";

/**
 * `signedOut`: known from the start that nobody is signed in — a page the server drew for a visitor without a session
 * cookie (src/prerender.tsx). The account check then has its answer at once, so the first render is the page itself
 * and not "checking account". `queryClient`: see App.
 */
export function AppProvider({
  children,
  signedOut = false,
  queryClient: given,
}: {
  children: ReactNode;
  signedOut?: boolean;
  /** A client that already holds answers the drawn page showed (src/main.tsx, src/prerender.tsx). */
  queryClient?: QueryClient;
}) {
  const [queryClient] = useState(() => {
    const client = given ?? createQueryClient();
    if (signedOut) client.setQueryData(meQueryOptions().queryKey, null);
    return client;
  });
  // Putts logged on the green (practice and ladder) wait in localStorage until the server has them; resume that
  // queue at start (or, opened with no signal, when the connection comes back).
  useEffect(() => {
    startOnlineState();
    return startOutbox(queryClient);
  }, [queryClient]);
  return (
    <QueryClientProvider client={queryClient}>
      {children}
      <Toaster
        position="top-center"
        closeButton
        toastOptions={{
          classNames: {
            toast: "rounded-xl! border-ink-900/10! bg-sand-50! font-sans! text-ink-900! shadow-lg!",
            title: "text-sm! font-medium!",
            error: "border-bad-600/40! bg-bad-50! text-bad-800!",
            success: "border-ok-600/40! bg-ok-50! text-ok-800!",
          },
        }}
      />
    </QueryClientProvider>
  );
}

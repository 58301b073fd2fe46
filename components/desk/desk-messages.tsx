"use client";

import { createContext, useCallback, useContext, useMemo, useRef, useState, type ReactNode } from "react";

// One polite status line for saves and one alert for refusals, shared by every panel of a page, so
// a screen reader hears each result once and sighted staff see it in the same place.

interface DeskMessages {
  announce: (message: string) => void;
  alert: (message: string) => void;
  clear: () => void;
}

const Context = createContext<DeskMessages | null>(null);

export function useDeskMessages(): DeskMessages {
  const value = useContext(Context);
  if (!value) throw new Error("useDeskMessages needs a DeskMessagesProvider");
  return value;
}

export function DeskMessagesProvider({ children }: { children: ReactNode }) {
  const [status, setStatus] = useState("");
  const [problem, setProblem] = useState("");
  const alertRef = useRef<HTMLDivElement>(null);
  const announce = useCallback((message: string) => {
    setProblem("");
    // The same words twice in a row are still a new event: clear, then set, so they are read again.
    setStatus("");
    window.setTimeout(() => setStatus(message), 50);
  }, []);
  const alert = useCallback((message: string) => {
    setStatus("");
    setProblem(message);
    window.setTimeout(() => alertRef.current?.focus(), 0);
  }, []);
  const clear = useCallback(() => {
    setStatus("");
    setProblem("");
  }, []);
  const value = useMemo(() => ({ announce, alert, clear }), [announce, alert, clear]);
  return (
    <Context.Provider value={value}>
      <div className="sticky top-0 z-10">
        <div
          ref={alertRef}
          tabIndex={-1}
          role="alert"
          data-testid="desk-alert"
          className={problem ? "mb-3 rounded-plate border-l-8 border-ember bg-ember-soft p-3 shadow focus:outline-none focus-visible:outline-3" : ""}
        >
          {problem ? (
            <div className="flex flex-wrap items-start justify-between gap-2">
              <p>
                <span aria-hidden="true" className="mr-2 font-bold">
                  !
                </span>
                <strong>Not done: </strong>
                {problem}
              </p>
              <button type="button" onClick={() => setProblem("")} className="min-h-11 px-2 font-bold text-harbour underline underline-offset-4">
                Dismiss
              </button>
            </div>
          ) : null}
        </div>
        <p
          role="status"
          aria-live="polite"
          data-testid="desk-status"
          className={status ? "mb-3 rounded-plate border-l-8 border-leaf bg-leaf-soft p-3 font-bold shadow" : "sr-only"}
        >
          {status ? (
            <>
              <span aria-hidden="true" className="mr-2">
                ✓
              </span>
              {status}
            </>
          ) : null}
        </p>
      </div>
      {children}
    </Context.Provider>
  );
}

"use client";
import { createContext, useContext, useState, type ReactNode } from "react";
import { useStore } from "zustand";
import { FieldIssuesProvider } from "@/components/ui/field-issues";
import { createPlannerStore, type PlannerState, type PlannerStore } from "./store";
import type { PlannerData } from "./types";

const PlannerStoreContext = createContext<PlannerStore | null>(null);

/** One store per open Planner (never a module singleton: the server renders many requests). */
export function PlannerProvider({ data, children }: { data: PlannerData; children: ReactNode }) {
  const [store] = useState(() => createPlannerStore(data));
  // Every field in the Planner tells the store when it shows an error, so Save and Submit can refuse.
  return (
    <PlannerStoreContext.Provider value={store}>
      <FieldIssuesProvider value={store.getState().actions.reportFieldIssue}>{children}</FieldIssuesProvider>
    </PlannerStoreContext.Provider>
  );
}

export function usePlannerStoreApi(): PlannerStore {
  const store = useContext(PlannerStoreContext);
  if (!store) throw new Error("usePlanner must be used inside <PlannerProvider>");
  return store;
}

export function usePlanner<T>(selector: (state: PlannerState) => T): T {
  return useStore(usePlannerStoreApi(), selector);
}

export function usePlannerActions(): PlannerState["actions"] {
  return usePlanner((s) => s.actions);
}

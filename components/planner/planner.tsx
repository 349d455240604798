"use client";
import { BalancePanel } from "./balance-panel";
import { BalanceSummary } from "./balance-summary";
import { LifterSection } from "./lifter-section";
import { LiftCheckSection } from "./lift-check-section";
import { MountControls } from "./mount-controls";
import { OperatingEnvelopeSection } from "./operating-envelope-section";
import { PayloadsSection } from "./payloads-section";
import { PlannerProvider } from "./planner-context";
import { PlannerScene } from "./planner-scene";
import { PlannerToolbar } from "./planner-toolbar";
import { GasSection, SiteSection, TetherSection } from "./site-gas-tether-sections";
import type { PlannerData } from "./types";

/**
 * The Planner: the 3D view as the main area, the balance panel beside it. On narrow screens the panel
 * falls below the inputs, so a summary of it comes first there (on a phone's first screen).
 */
export function Planner({ data }: { data: PlannerData }) {
  return (
    <PlannerProvider data={data}>
      <div className="space-y-4" data-testid="planner">
        <PlannerToolbar />
        <div className="grid gap-4 lg:grid-cols-[minmax(0,1fr)_24rem]">
          <div className="space-y-4">
            <BalanceSummary />
            <PlannerScene />
            <MountControls />
            <LifterSection />
            <SiteSection />
            <GasSection />
            <LiftCheckSection />
            <TetherSection />
            <OperatingEnvelopeSection />
            <PayloadsSection />
          </div>
          <BalancePanel />
        </div>
      </div>
    </PlannerProvider>
  );
}

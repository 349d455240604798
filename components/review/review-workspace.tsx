"use client";
import { BalancePanel } from "@/components/planner/balance-panel";
import { PlannerProvider } from "@/components/planner/planner-context";
import { PlannerScene } from "@/components/planner/planner-scene";
import type { PlannerData } from "@/components/planner/types";
import { formatQuantity } from "@/lib/units";
import type { ReactNode } from "react";

interface ReviewWorkspaceProps {
  data: PlannerData;
  /** The thread, the decision form and the history, beside the figures. */
  children: ReactNode;
}

/** The Planner's 3D view and balance report, read-only at the stored result, with the reviewer's tools. */
export function ReviewWorkspace({ data, children }: ReviewWorkspaceProps) {
  const units = data.unitSystem;
  return (
    <PlannerProvider data={{ ...data, readOnly: true }}>
      <div className="grid gap-4 lg:grid-cols-[minmax(0,1fr)_24rem]">
        <div className="space-y-4">
          <PlannerScene />
          <section className="panel p-4" aria-labelledby="payloads-title">
            <h2 id="payloads-title" className="text-lg">
              Payloads on the mount
            </h2>
            {data.draft.payloads.length === 0 ? (
              <p className="mt-2 text-sm text-muted">No payloads.</p>
            ) : (
              <table className="mt-2 w-full text-sm" data-testid="review-payloads">
                <thead className="text-left text-muted">
                  <tr>
                    <th className="py-1 font-medium">Payload</th>
                    <th className="py-1 font-medium">Kind</th>
                    <th className="py-1 font-medium">Mass</th>
                    <th className="py-1 font-medium">Attachment</th>
                    <th className="py-1 font-medium">Size</th>
                  </tr>
                </thead>
                <tbody>
                  {data.draft.payloads.map((p, i) => (
                    <tr key={i} className="border-t border-hairline">
                      <td className="py-1">{p.name}</td>
                      <td className="py-1">{p.category}</td>
                      <td className="figure py-1">{formatQuantity("mass", p.massKg, units)}</td>
                      <td className="py-1">
                        {p.attachment}
                        {p.adapterId ? " with adapter" : ""}
                      </td>
                      <td className="figure py-1">
                        {[p.lengthM, p.widthM, p.heightM].map((m) => formatQuantity("smallLength", m, units)).join(" × ")}
                      </td>
                    </tr>
                  ))}
                </tbody>
              </table>
            )}
          </section>
          {children}
        </div>
        <BalancePanel />
      </div>
    </PlannerProvider>
  );
}

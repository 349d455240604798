"use client";

export function PrintButton() {
  return (
    <button type="button" onClick={() => window.print()} className="rounded bg-accent px-3 py-1.5 font-medium text-white">
      Print
    </button>
  );
}

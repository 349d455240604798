// The usual cautions of tethered flight, the ones a setup triggers first. The moored-balloon size
// and tether-height rules are the engine's own flags; these apply to every flight. Shown in the
// Planner and printed on the field report.

export function cautionsFor({ hasAntenna, freeLiftKg }: { hasAntenna: boolean; freeLiftKg: number }): string[] {
  const items: string[] = [];
  if (hasAntenna)
    items.push(
      "Antennas and conductive tethers can carry current from power lines or static: keep far from overhead lines and never fly near thunderstorms.",
    );
  if (freeLiftKg <= 0) items.push("Without free lift it will not fly: do not release it to find out.");
  items.push("Helium cylinders are high-pressure vessels: secure them upright and use a proper regulator.");
  items.push(
    "Never fly near power lines, roads or airports, or in thunderstorms; follow local aviation rules (for example 14 CFR Part 101 in the US) and licensed practice.",
  );
  items.push("These are planning estimates: make a test flight on a safety line before trusting a payload to it.");
  return items;
}

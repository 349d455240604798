/**
 * The words of every flag, from its code, level, figures and parameters, in the reader's units.
 * The engine words its own `message` with these in metric (lib/balance/flags.ts), so the API, the
 * CLI and the UI say the same thing. Pure: safe in client components and in the engine.
 */
import type { FlagCode, FlagLevel, UnitSystem } from "@/lib/domain";
import type { AirCase, Figure, FlagData, LineEnd, PayloadRef } from "@/lib/balance/flag-shape";
import type { LossSource } from "@/lib/balance/helium";
import type { Attachment } from "@/lib/balance/schema";
import { formatQuantity } from "@/lib/units";

/** Formats figures in one unit system. */
interface Say {
  /** The value with its sign, e.g. "-12 g". */
  value(figure: Figure): string;
  /** The value without its sign, where the words say which side it lies. */
  size(figure: Figure): string;
  /** The limit the value is judged against (NaN shows a missing limit, and tests catch it). */
  limit(figure: Figure): string;
  /** Whether the value reads as zero at its display precision. */
  readsAsZero(figure: Figure): boolean;
}

// formatQuantity takes lib/units.ts's Quantity: a figure quantity it cannot show fails to compile here.
function sayIn(system: UnitSystem): Say {
  return {
    value: (f) => formatQuantity(f.quantity, f.value, system),
    size: (f) => formatQuantity(f.quantity, Math.abs(f.value), system),
    limit: (f) => formatQuantity(f.quantity, f.limit ?? Number.NaN, system),
    readsAsZero: (f) => formatQuantity(f.quantity, Math.abs(f.value), system) === formatQuantity(f.quantity, 0, system),
  };
}

// Made once: the engine words every flag of every evaluation, on every drag of the mount.
const SAY: Readonly<Record<UnitSystem, Say>> = { metric: sayIn("metric"), imperial: sayIn("imperial") };

/** A load factor or safety factor as people write it: "2", "2.5". */
const factor = (n: number): string => String(Math.round(n * 100) / 100 || 0);

/** "3.2° nose up", "1.0° nose down", or "level (0.0°)" when it rounds to nothing. */
function attitude(trim: Figure<"angle">, say: Say): string {
  const size = say.size(trim);
  if (say.readsAsZero(trim)) return `level (${size})`;
  return `${size} ${trim.value > 0 ? "nose up" : "nose down"}`;
}

/** The judgement after a figure: "; stop beyond ±30.0°", "; caution beyond ±10.0°", ", within ±10.0°". */
function beyond(level: FlagLevel, limitText: string): string {
  return level === "ok" ? `, within ${limitText}` : `; ${level} beyond ${limitText}`;
}

const AT: Record<AirCase, string> = { calm: "in calm air", wind: "in the wind", gust: "in gusts" };
const inCase = (airCase: "wind" | "gust", speed: Figure, say: Say): string =>
  `in ${airCase === "wind" ? "wind" : "gusts"} of ${say.value(speed)}`;
const capitalised = (text: string): string => text.charAt(0).toUpperCase() + text.slice(1);

/** The payloads a flag names: "logger", "logger and whip", "whip (×2)"; capitalised to open a sentence. */
function payloadNames(payloads: readonly PayloadRef[] | undefined, opening = false): { text: string; plural: boolean } {
  const counts = new Map<string, number>();
  for (const p of payloads ?? []) counts.set(p.name, (counts.get(p.name) ?? 0) + 1);
  const names = [...counts].map(([name, n]) => (n > 1 ? `${name} (×${n})` : name));
  const text = names.length <= 1 ? (names[0] ?? "the payload") : `${names.slice(0, -1).join(", ")} and ${names[names.length - 1]}`;
  return { text: opening ? capitalised(text) : text, plural: (payloads?.length ?? 0) > 1 };
}

const attachmentWords = (a: Attachment): string => (a === "strap" ? "a strap clamp" : a);

type Wording<C extends FlagCode> = (flag: FlagData<C>, say: Say) => string;

function windTrim(flag: FlagData<"trim-wind" | "trim-gust">, say: Say): string {
  const { speed, trim } = flag.figures;
  const at = inCase(flag.params.case, speed, say);
  if (flag.params.failure === "no-free-lift") {
    return `${capitalised(at)} it does not fly: without free lift it cannot be launched and comes down in every lull, whatever the sail lifts.`;
  }
  if (flag.params.failure === "cannot-fly") {
    return `${capitalised(at)} it cannot fly: gas and sail together lift less than it weighs.`;
  }
  if (flag.params.failure === "no-equilibrium" || !trim) {
    return `${capitalised(at)} it has no stable trim: it would not settle at any pitch.`;
  }
  return `Trim ${at} is ${attitude(trim, say)}${beyond(flag.level, `±${say.limit(trim)}`)}.`;
}

const OTHER_END: Record<LineEnd, LineEnd> = { lifter: "anchor", anchor: "lifter" };

function tetherAngle(flag: FlagData<"tether-angle-wind" | "tether-angle-gust">, say: Say): string {
  const { speed, angle, otherEnd } = flag.figures;
  const end = flag.params.end;
  // With the line's shape known, the worse end is named and the other given beside it.
  const where = end ? ` at the ${end}${otherEnd ? ` (${say.value(otherEnd)} at the ${OTHER_END[end]})` : ""}` : "";
  const text = `Tether angle ${inCase(flag.params.case, speed, say)} is ${say.value(angle)} from vertical${where}`;
  const downwind = flag.level === "stop" ? ": it would be blown down towards the ground" : "";
  return `${text}${beyond(flag.level, say.limit(angle))}${downwind}.`;
}

const LOSS_WORDS: Record<LossSource, string> = {
  given: "",
  fabric: " through the fabric",
  default: " (a rule of thumb: no fabric area is known)",
};

const MESSAGES: { readonly [C in FlagCode]: Wording<C> } = {
  "free-lift": ({ level, figures: { freeLift, ratio } }, say) => {
    if (level === "stop" || !ratio) {
      return freeLift.value < 0 && !say.readsAsZero(freeLift)
        ? `It weighs ${say.size(freeLift)} more than it lifts: it does not fly.`
        : `It has no free lift (${say.size(freeLift)}): it does not fly.`;
    }
    const text = `Free lift is ${say.value(freeLift)}, ${say.value(ratio)} of gross lift`;
    return level === "caution" ? `${text}; caution below ${say.limit(ratio)}.` : `${text} (caution below ${say.limit(ratio)}).`;
  },

  "trim-calm": ({ level, figures: { trim } }, say) => {
    const text = `Calm trim is ${attitude(trim, say)}${beyond(level, `±${say.limit(trim)}`)}`;
    return level === "ok" ? `${text}.` : `${text}. Slide the mount ${trim.value > 0 ? "forward" : "aft"}.`;
  },

  "trim-unstable": () =>
    "It has no stable trim: its centre of mass is too high against its centre of buoyancy for this " +
    "tether point, so it would roll over. Lower the payload or the tether point.",

  "trim-wind": windTrim,
  "trim-gust": windTrim,
  "tether-angle-wind": tetherAngle,
  "tether-angle-gust": tetherAngle,

  "mount-off-rail": ({ level, figures: { position, railStart, railEnd } }, say) => {
    const rail = `from ${say.value(railStart)} to ${say.value(railEnd)}`;
    return level === "ok"
      ? `The mount at ${say.value(position)} from the nose is on the rail (${rail}).`
      : `The mount at ${say.value(position)} from the nose is off the rail, which runs ${rail}.`;
  },

  "thread-mismatch": ({ level, params, payloads }) => {
    const { text, plural } = payloadNames(payloads, true);
    if (level === "ok") {
      const via = params.viaAdapter ? ` through an adapter from ${params.payloadThread}` : "";
      return `${text} ${plural ? "fit" : "fits"} the mount's ${params.mountThread} screw${via}.`;
    }
    return (
      `${text} ${plural ? "have" : "has"} a ${params.payloadThread} thread and the mount a ` +
      `${params.mountThread} screw: fit ${plural ? "each" : "it"} with an adapter.`
    );
  },

  "adapter-mismatch": ({ params, payloads }) => {
    const { text, plural } = payloadNames(payloads);
    return (
      `The adapter on the ${text} joins ${attachmentWords(params.adapterFrom)} to ${params.adapterTo}, ` +
      `but ${plural ? "the payloads have" : "the payload has"} a ${params.payloadThread} thread and the mount a ` +
      `${params.mountThread} screw: use one from ${params.payloadThread} to ${params.mountThread}.`
    );
  },

  "mount-rated-load": ({ level, figures: { load, share }, params }, say) => {
    const text = `Gust load on the mount is ${say.value(load)} (${factor(params.loadFactor)} × what hangs from it)`;
    if (level === "stop") return `${text}, more than its rated ${say.limit(load)}.`;
    if (level === "caution" && share) {
      return `${text}, ${say.value(share)} of its rated ${say.limit(load)}; caution above ${say.limit(share)}.`;
    }
    return `${text}, within its rated ${say.limit(load)}.`;
  },

  "thread-capacity": ({ level, figures: { load }, params, payloads }, say) => {
    const name = payloadNames(payloads).text;
    const screw =
      params.screw === "mount"
        ? `the mount's ${params.thread} screw`
        : params.screw === "adapter"
          ? `the ${params.thread} thread of the adapter on the ${name}`
          : `the ${params.thread} thread of the ${name}`;
    const text =
      `The most loaded screw, ${screw}, takes ${say.value(load)} in gusts ` +
      `(${factor(params.loadFactor)} × the weight it carries) against its proof load of ${say.limit(load)}`;
    return level === "stop"
      ? `${text}: more than it can take.`
      : level === "caution"
        ? `${text}: more than half of it.`
        : `${text}, under half of it.`;
  },

  "safety-line": ({ level, figures: { breakingLoad, needed }, params }, say) => {
    const times = (n: number) => `${factor(n)} × the payloads' weight`;
    if (!breakingLoad) {
      const strength = needed ? ` that holds at least ${say.value(needed)}` : "";
      return `No safety line is given: fly the payloads on one${strength} (${times(params.safetyLineFactor)}).`;
    }
    const text = `The safety line breaks at ${say.value(breakingLoad)}`;
    if (level === "stop")
      return `${text}, below the payloads' gust load of ${say.limit(breakingLoad)} (${factor(params.loadFactor)} × their weight).`;
    if (level === "caution") return `${text}; at least ${say.limit(breakingLoad)} (${times(params.safetyLineFactor)}) is advised.`;
    return `${text}, at least the ${say.limit(breakingLoad)} advised (${times(params.safetyLineFactor)}).`;
  },

  "clearance-hull": ({ level, figures: { gap }, payloads }, say) => {
    const { text, plural } = payloadNames(payloads, true);
    if (level === "stop") return `${text} ${plural ? "cut" : "cuts"} into the hull by ${say.size(gap)}.`;
    const clears = `${text} ${plural ? "clear" : "clears"} the hull by`;
    return level === "caution"
      ? `${clears} only ${say.value(gap)}; caution below ${say.limit(gap)}.`
      : `${clears} ${say.value(gap)} (caution below ${say.limit(gap)}).`;
  },

  "clearance-tether": ({ level, figures: { gap, speed }, payloads }, say) => {
    const { text, plural } = payloadNames(payloads, true);
    const where = speed ? `in wind of ${say.value(speed)}` : "in calm air";
    if (level === "stop") return `${text} ${plural ? "touch" : "touches"} the tether ${where} (gap ${say.size(gap)}).`;
    const clears = `${text} ${plural ? "clear" : "clears"} the tether ${where} by`;
    return level === "caution"
      ? `${clears} only ${say.value(gap)}; caution below ${say.limit(gap)}.`
      : `${clears} ${say.value(gap)} (caution below ${say.limit(gap)}).`;
  },

  "tether-length": ({ level, figures: { lineOut, lineMass, freeLift, freeLiftLeft } }, say) => {
    const most = `it can hold up at most ${say.limit(lineOut)} in calm air`;
    if (level === "stop" && lineMass && freeLift) {
      return (
        `The ${say.value(lineOut)} of tether out weighs ${say.value(lineMass)}, more than the free lift of ` +
        `${say.value(freeLift)}: ${most}.`
      );
    }
    if (level === "caution" && freeLiftLeft) {
      return (
        `With ${say.value(lineOut)} of tether out, the free lift left is ${say.value(freeLiftLeft)} of ` +
        `gross lift; caution below ${say.limit(freeLiftLeft)}. ${capitalised(most)}.`
      );
    }
    return `The ${say.value(lineOut)} of tether out is within the ${say.limit(lineOut)} it can hold up in calm air.`;
  },

  "tether-strength": ({ level, figures: { tension, breakingLoad }, params }, say) => {
    const at = `${AT[params.case]}${params.end === "anchor" ? " at the anchor" : ""}`;
    if (level === "stop") {
      return (
        `The largest tether tension, ${say.value(tension)} ${at}, is at or above the tether's breaking load of ` +
        `${say.value(breakingLoad)}: it would break.`
      );
    }
    return (
      `The largest tether tension is ${say.value(tension)} ${at}, ${level === "ok" ? "within" : "more than"} ` +
      `the ${say.limit(tension)} that keeps a safety factor of ${factor(params.safetyFactor)} on the tether's ` +
      `breaking load of ${say.value(breakingLoad)}.`
    );
  },

  "tether-on-ground": ({ figures: { onGround, lineOut, speed }, params }, say) =>
    `${capitalised(inCase(params.case, speed, say))}, ${say.value(onGround)} of the ${say.value(lineOut)} of tether out ` +
    "lies on the ground: the lifter cannot hold its line up in that wind and flies lower, and the line can snag or be walked over.",

  "helium-top-up": ({ figures: { topUpAfter, lossPerDay, freeLiftRatio }, params }, say) =>
    // A flag stored before the loss had a source has no lossSource: it says nothing of one.
    `Top up after about ${say.value(topUpAfter)}: losing ${say.value(lossPerDay)} of the gas a day${LOSS_WORDS[params.lossSource] ?? ""}, free lift ` +
    `falls from ${say.value(freeLiftRatio)} of gross lift to the ${say.limit(freeLiftRatio)} caution limit by then.`,

  "moored-balloon-rules": ({ level, figures: { gasVolume, diameter } }, say) => {
    const part = (label: string, f: Figure) =>
      `${label} ${say.value(f)} (${f.value > (f.limit ?? Infinity) ? "over" : "under"} ${say.limit(f)})`;
    const parts = [part("Gas volume", gasVolume), ...(diameter ? [part("largest diameter", diameter)] : [])];
    const subject = parts.join(" and ");
    const plural = parts.length > 1;
    return level === "ok"
      ? `${subject} ${plural ? "keep" : "keeps"} it under the US size thresholds (14 CFR 101.1); local rules still apply.`
      : `${subject} ${plural ? "put" : "puts"} it over a US size threshold (14 CFR 101.1): Part 101 applies ` +
          "(distance from airports, clearance from cloud, a height ceiling). Check your local rules too.";
  },

  "tether-height": ({ figures: { usNotice, ukPermission } }, say) =>
    `With ${say.value(usNotice)} of tether out it can fly higher than ${say.limit(usNotice)}: in the US a balloon ` +
    "under Part 101 then needs notice to the nearest air traffic control facility 24 hours before (14 CFR 101.15) " +
    `and pennants or lights on the tether (101.17); in the UK, flying higher than ${say.limit(ukPermission)} needs ` +
    "permission (Air Navigation Order 2016, art. 92).",
};

/** The flag's message in the reader's units. */
export function flagMessage(flag: FlagData, system: UnitSystem): string {
  const wording = MESSAGES[flag.code] as Wording<FlagCode>;
  return wording(flag, SAY[system]);
}

/**
 * What a heavier payload would run into, for the stop that limits it ("beyond that …").
 * Codes that never stop for mass still have words, so every code has some.
 */
export const STOP_CAUSES: { readonly [C in FlagCode]: string } = {
  "free-lift": "the free lift runs out",
  "trim-calm": "the calm trim goes past its limit",
  "trim-unstable": "it would roll over",
  "trim-wind": "the trim in the wind goes past its limit",
  "trim-gust": "the trim in gusts goes past its limit",
  "tether-angle-wind": "the wind blows it down too far",
  "tether-angle-gust": "gusts blow it down too far",
  "mount-off-rail": "the mount would have to leave the rail",
  "thread-mismatch": "a thread does not fit",
  "adapter-mismatch": "an adapter does not fit",
  "mount-rated-load": "the mount's rated load is passed",
  "thread-capacity": "a screw is overloaded",
  "safety-line": "the safety line is too weak",
  "clearance-hull": "a payload cuts into the hull",
  "clearance-tether": "a payload touches the tether",
  "tether-length": "the free lift cannot hold up the tether",
  "tether-strength": "the tether is too weak",
  "tether-on-ground": "the line drags on the ground",
  "helium-top-up": "it needs a top-up at once",
  "moored-balloon-rules": "it falls under moored-balloon rules",
  "tether-height": "it flies too high",
};

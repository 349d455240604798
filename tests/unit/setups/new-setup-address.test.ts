import { describe, expect, it } from "vitest";
import { newSetupFailurePath, newSetupProblemFrom } from "@/components/setups/new-setup-address";
import { UNKNOWN_MODEL_MESSAGE, newSetupProblemOf } from "@/components/setups/new-setup-problem";
import { MAX_NAME_LENGTH } from "@/lib/domain";

const query = (path: string) => Object.fromEntries(new URL(path, "http://app.test").searchParams);
const badName = {
  code: "bad_request" as const,
  message: "The request body is not valid.",
  issues: [{ path: "name", message: "Give the setup a name." }],
};
const unknownModel = {
  code: "bad_request" as const,
  message: "That envelope model is not in the catalogue.",
  issues: [{ path: "modelId", message: "unknown envelope model" }],
};

describe("the new-setup form's way back without JavaScript", () => {
  it("sends a stranger to sign-in with the way back to the list", () => {
    expect(newSetupFailurePath({ code: "unauthenticated", message: "Sign in to continue." }, { name: "Kite" })).toBe(
      "/sign-in?next=%2Fsetups",
    );
  });

  it("returns to the list with the failing field and what was typed, and the page words the problem from the schema", () => {
    const path = newSetupFailurePath(badName, { name: "  ", modelId: "mdl-ridge" });
    expect(query(path)).toEqual({ problem: "name", name: "  ", modelId: "mdl-ridge" });
    expect(newSetupProblemFrom(query(path))).toEqual({ field: "name", message: "Give the setup a name." });

    const long = "k".repeat(MAX_NAME_LENGTH + 1);
    const tooLong = query(newSetupFailurePath(badName, { name: long, modelId: "mdl-ridge" }));
    expect(tooLong.name).toBe(long);
    expect(newSetupProblemFrom(tooLong)).toEqual({ field: "name", message: `At most ${MAX_NAME_LENGTH} characters.` });
  });

  it("keeps at most 200 characters of a very long name in the address, still too long to pass", () => {
    const back = query(newSetupFailurePath(badName, { name: "x".repeat(50_000) }));
    expect(back.name).toHaveLength(200);
    expect(newSetupProblemFrom(back)?.field).toBe("name");
  });

  it("points at the model for an unknown model or none, and at nothing for any other refusal", () => {
    expect(query(newSetupFailurePath(unknownModel, { name: "Kite", modelId: "mdl-nope" })).problem).toBe("modelId");
    expect(newSetupProblemFrom({ problem: "modelId" })).toEqual({ field: "modelId", message: UNKNOWN_MODEL_MESSAGE });
    const neither = {
      code: "bad_request" as const,
      message: "x",
      issues: [{ path: "draft", message: "Send either a draft or a modelId." }],
    };
    expect(newSetupProblemOf(neither).field).toBe("modelId");
    expect(query(newSetupFailurePath({ code: "conflict", message: "Busy." }, {})).problem).toBe("other");
    expect(newSetupProblemFrom({ problem: "other" })?.field).toBeNull();
  });

  it("never shows words taken from the address, and nothing without a problem", () => {
    expect(newSetupProblemFrom({})).toBeNull();
    const crafted = newSetupProblemFrom({ problem: "Call this number now", name: "fine name" });
    expect(crafted?.message).not.toContain("Call this number");
    // a name that passes cannot be the problem: the general words, not a made-up field error
    expect(newSetupProblemFrom({ problem: "name", name: "A good name" })?.field).toBeNull();
  });

  it("words the JSON route's refusals for the enhanced form the same way", () => {
    expect(newSetupProblemOf(badName)).toEqual({ field: "name", message: "Give the setup a name." });
    expect(newSetupProblemOf(unknownModel)).toEqual({ field: "modelId", message: UNKNOWN_MODEL_MESSAGE });
    expect(newSetupProblemOf({ code: "forbidden", message: "Your role does not allow this." })).toEqual({
      field: null,
      message: "Your role does not allow this.",
    });
  });
});

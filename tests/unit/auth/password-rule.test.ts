import { describe, expect, it } from "vitest";
import { PASSWORD_MAX_LENGTH, passwordLength, passwordShapeProblem } from "@/lib/auth/password-rule";
import { passwordProblem } from "@/lib/auth/password-strength";
import { DEMO_PASSWORD } from "@/db/seed-data";

describe("the password's shape", () => {
  it("counts characters without the spaces at either end", () => {
    expect(passwordLength("  abc  ")).toBe(3);
    expect(passwordLength("ünïcødé✓✓✓✓")).toBe(11);
    expect(passwordShapeProblem("12345678")?.code).toBe("PASSWORD_TOO_SHORT");
    expect(passwordShapeProblem(" ".repeat(8))?.code).toBe("PASSWORD_TOO_SHORT");
    expect(passwordShapeProblem(" ".repeat(40))?.code).toBe("PASSWORD_TOO_SHORT");
    expect(passwordShapeProblem("   ab cd ef    ")?.code).toBe("PASSWORD_TOO_SHORT");
    expect(passwordShapeProblem("x".repeat(PASSWORD_MAX_LENGTH + 1))?.code).toBe("PASSWORD_TOO_LONG");
    expect(passwordShapeProblem("ab cd ef gh")).toBeNull();
  });
});

describe("the password's strength (server)", () => {
  it("refuses common passwords, repeats, keyboard rows and the service's own name", () => {
    // Common passwords and patterns, from memory of typical leaked-password lists.
    for (const weak of ["1234567890", "password1234", "qwertyuiop12", "aaaaaaaaaaaa", "iloveyou2024", "trimrail-demo", "Trimrail2026!"]) {
      expect(passwordProblem(weak)?.code, weak).toBe("PASSWORD_TOO_WEAK");
    }
    expect(passwordProblem("password1234")?.message).toMatch(/too easy to guess.*“password/);
  });

  it("refuses a password built on the person's own name or address", () => {
    expect(passwordProblem("halloway-wren", ["Wren Halloway", "wren@trimrail.test"])?.code).toBe("PASSWORD_TOO_WEAK");
    expect(passwordProblem("halloway-wren", ["Wren Halloway", "wren@trimrail.test"])?.message).toMatch(/your name/);
  });

  it("accepts a few unrelated words, and the demo password", () => {
    for (const fine of ["dune-lantern-47", "copper kettle orbit", "wren.harbour.7", DEMO_PASSWORD]) {
      expect(passwordProblem(fine), fine).toBeNull();
    }
  });

  it("checks the shape first, so blank-ish input never reaches the estimator", () => {
    expect(passwordProblem(" ".repeat(12))?.code).toBe("PASSWORD_TOO_SHORT");
  });
});

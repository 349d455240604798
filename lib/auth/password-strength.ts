import "server-only";
import { ZxcvbnFactory, type Match } from "@zxcvbn-ts/core";
import { adjacencyGraphs, dictionary } from "@zxcvbn-ts/language-common";
import { passwordShapeProblem, type PasswordProblem } from "./password-rule";

// The strength half of the password rule, on the server only (the common-password list is about
// a megabyte). zxcvbn estimates how many guesses a cracker needs, matching the password against
// lists of common passwords and names, keyboard walks, repeats, sequences and dates (Wheeler,
// "zxcvbn: Low-Budget Password Strength Estimation", USENIX Security 2016). We refuse scores below
// 3, i.e. fewer than about 10^8 guesses; a dictionary word inside a longer passphrase is fine.
export const MIN_PASSWORD_SCORE = 3;

// Words of this service count as guessable, as NIST SP 800-63B §5.1.1.2 asks for "context-specific
// words, such as the name of the service".
const SERVICE_WORDS = ["trimrail"];

const estimator = new ZxcvbnFactory({ dictionary, graphs: adjacencyGraphs });

function hint(sequence: Match[]): string {
  const found = sequence.find((m) => m.pattern !== "bruteforce" && m.pattern !== "separator");
  switch (found?.pattern) {
    case "dictionary":
      if (found.dictionaryName === "userInputs") return ` It contains your name, your address or this service's name (“${found.token}”).`;
      return ` It is built on a common password, word or name (“${found.token}”).`;
    case "repeat":
      return " It repeats the same characters.";
    case "sequence":
      return " It follows a sequence such as abcd or 1234.";
    case "spatial":
      return " It follows a row of keys.";
    case "date":
    case "regex":
      return " It leans on a date or a year.";
    default:
      return "";
  }
}

/**
 * Why `password` is refused, or null when it is acceptable. `personal`: the person's own words
 * (name, e-mail address), which make a password easier to guess for anyone who knows them.
 */
export function passwordProblem(password: string, personal: readonly string[] = []): PasswordProblem | null {
  const shape = passwordShapeProblem(password);
  if (shape) return shape;
  const inputs = [...SERVICE_WORDS, ...personal.flatMap((p) => p.toLowerCase().split(/[^\p{L}\p{N}]+/u)).filter((w) => w.length >= 3)];
  const result = estimator.check(password.trim(), inputs);
  if (result.score >= MIN_PASSWORD_SCORE) return null;
  return {
    code: "PASSWORD_TOO_WEAK",
    message: `This password is too easy to guess.${hint(result.sequence)} Try three or four unrelated words, or a longer phrase.`,
  };
}

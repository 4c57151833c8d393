import { ZxcvbnFactory } from "@zxcvbn-ts/core";
import * as common from "@zxcvbn-ts/language-common";

// New passwords are checked with zxcvbn-ts (its common-password, name and word lists and its
// pattern matchers: repeats, sequences, keyboard rows, dates), as NIST SP 800-63B §5.1.1.2
// asks: refuse values from lists of commonly used or compromised passwords, repetitive or
// sequential characters, and context-specific words (the person's name and e-mail). A score
// below 3 ("safely unguessable": about 10^10 guesses, zxcvbn's own scale) is refused.
export const MIN_SCORE = 3;

let checker: ZxcvbnFactory | null = null;
const zxcvbn = () => (checker ??= new ZxcvbnFactory({ dictionary: { ...common.dictionary }, graphs: common.adjacencyGraphs }));

// zxcvbn-ts names its warnings by key; the words are ours.
const reasons: Record<string, string> = {
  simpleRepeat: "it repeats one character or a short pattern",
  extendedRepeat: "it repeats a pattern",
  sequences: "it is a sequence such as abcdef or 123456",
  topTen: "it is one of the most common passwords",
  topHundred: "it is one of the most common passwords",
  common: "it is on lists of commonly used passwords",
  similarToCommon: "it is close to a commonly used password",
  keyPattern: "it follows a pattern of keys on the keyboard",
  straightRow: "it is a row of keys on the keyboard",
  dates: "it is mostly a date",
  recentYears: "it is mostly a year",
  namesByThemselves: "it is mostly a name",
  commonNames: "it is mostly a common name",
  userInputs: "it contains your name, e-mail address or firm",
  wordByItself: "it is a single common word",
};

/** Why a new password is too easy to guess, naming the field; null when it is fine. */
export function passwordWeakness(password: string, userInputs: string[] = []): string | null {
  if (password.trim() === "") return "Password cannot be only spaces.";
  const inputs = userInputs.flatMap((s) => [s, ...s.split(/[@.\s_-]+/)]).filter((s) => s.length >= 3);
  const r = zxcvbn().check(password, inputs);
  if (r.score >= MIN_SCORE) return null;
  const why = (r.feedback.warning && reasons[r.feedback.warning]) ?? "it would be quick to guess";
  return `Password is too easy to guess: ${why}. Choose a longer one, such as a few unrelated words.`;
}

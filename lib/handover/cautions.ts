/**
 * The cautions every handover report, print view and e-mail carries (product.md, Safety).
 * The first one is the e-mail's first caution line. Usual trade cautions in our own words;
 * they defer to local codes and licensed practice rather than restate them.
 */
export interface Caution { title: string; text: string }

export const HANDOVER_CAUTIONS: readonly Caution[] = [
  { title: "Design aid", text: "The results in this report are design aids, to be checked by a competent person before anything is built or changed." },
  { title: "Codes and instructions", text: "Local codes and regulations, the manufacturers' installation instructions and licensed practice govern over anything in this report." },
  { title: "Stored hot water and legionella", text: "Stored hot water must be kept and cycled hot enough to control legionella, and can scald at the taps: follow the cylinder maker's instructions and local rules for store temperature, pasteurisation and blending." },
  { title: "Isolation before work", text: "Isolate the electrical supply (and lock it off) and isolate, depressurise and drain the part of the system concerned before working on it; let hot parts cool." },
  { title: "Pressure testing", text: "Pressure-test with water, never above the lowest rating of the parts under test; keep people clear, release the pressure before breaking any joint, and follow the firm's test procedure." },
  { title: "Work at height", text: "Hanging or servicing an outdoor unit is work at height: plan it, use suitable access equipment and fixings rated for the unit's weight, and do not work alone." },
  { title: "Refrigerant", text: "The heat pump's refrigerant circuit is opened only by a person licensed for the refrigerant it holds." },
];

/** One line for the e-mail: the first caution, as a sentence. */
export const FIRST_CAUTION_LINE = HANDOVER_CAUTIONS[0]!.text;

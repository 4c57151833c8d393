/**
 * Emitters: heat output of radiators by the EN 442-2 characteristic equation
 * (logarithmic mean excess temperature, nominal 75/65/20 °C) and its closed-form
 * inverses (rating needed, lowest flow temperature), the emitter's
 * output and return temperature at a given flow (heat balance, bisection), and
 * the EN 1264 basic characteristic for floor heating.
 */
export * from "./en442";
export * from "./en442-inverse";
export * from "./emitter-at-flow";
export * from "./en1264";

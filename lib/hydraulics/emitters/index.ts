/**
 * Emitters: heat output of radiators by the EN 442-2 characteristic equation
 * (logarithmic mean excess temperature, nominal 75/65/20 °C), the emitter's
 * output and return temperature at a given flow (heat balance, bisection), and
 * the EN 1264 basic characteristic for floor heating.
 */
export * from "./en442";
export * from "./emitter-at-flow";
export * from "./en1264";

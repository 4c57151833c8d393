/**
 * Friction: Darcy friction factor for full circular pipes — Reynolds number,
 * laminar 64/Re, Colebrook–White (solved iteratively), explicit Swamee–Jain and
 * Haaland approximations, and darcyFrictionFactor() which picks the regime
 * (laminar / linear transition 2300–4000 / Colebrook).
 */
export { reynolds } from "./reynolds";
export { colebrook, FRICTION_VALIDITY, frictionFormulaValid, fullyRoughFrictionFactor, haaland, laminar, swameeJain } from "./colebrook";
export { darcyFrictionFactor, RE_LAMINAR_MAX, RE_NO_FLOW, RE_TURBULENT_MIN, type FlowRegime } from "./darcy";

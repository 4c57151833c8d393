/**
 * Vessels: expansion-vessel sizing — EN 12828 Annex D for diaphragm vessels
 * (expansion volume, water reserve, pre-charge, final pressure, nominal volume,
 * minimum fill pressure), with the ASHRAE tank equations as a cross-check.
 */
export * from "./en12828";
export * from "./ashrae";

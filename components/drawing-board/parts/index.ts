/** Symbol component of every part type (one folder per type). */
import type { ComponentType } from "react";
import type { PartType } from "@/lib/schematic";
import type { SymbolProps } from "./symbol-kit";
import { AirVentSymbol } from "./air-vent/symbol";
import { BalancingValveSymbol } from "./balancing-valve/symbol";
import { BoilerSymbol } from "./boiler/symbol";
import { BufferVesselSymbol } from "./buffer-vessel/symbol";
import { CheckValveSymbol } from "./check-valve/symbol";
import { CylinderSymbol } from "./cylinder/symbol";
import { DiverterValveSymbol } from "./diverter-valve/symbol";
import { DpBypassValveSymbol } from "./dp-bypass-valve/symbol";
import { DrainCockSymbol } from "./drain-cock/symbol";
import { ExpansionVesselSymbol } from "./expansion-vessel/symbol";
import { FanCoilSymbol } from "./fan-coil/symbol";
import { FillingLoopSymbol } from "./filling-loop/symbol";
import { HeatLoadSymbol } from "./heat-load/symbol";
import { HeatMeterSymbol } from "./heat-meter/symbol";
import { HeatPumpSymbol } from "./heat-pump/symbol";
import { IsolationValveSymbol } from "./isolation-valve/symbol";
import { LowLossHeaderSymbol } from "./low-loss-header/symbol";
import { MagneticFilterSymbol } from "./magnetic-filter/symbol";
import { ManifoldSymbol } from "./manifold/symbol";
import { PressureGaugeSymbol } from "./pressure-gauge/symbol";
import { PumpSymbol } from "./pump/symbol";
import { RadiatorSymbol } from "./radiator/symbol";
import { SafetyValveSymbol } from "./safety-valve/symbol";
import { StrainerSymbol } from "./strainer/symbol";
import { TeeSymbol } from "./tee/symbol";
import { TemperatureSensorSymbol } from "./temperature-sensor/symbol";
import { UfhLoopSymbol } from "./ufh-loop/symbol";
import { ZoneValveSymbol } from "./zone-valve/symbol";

export const symbols: Record<PartType, ComponentType<SymbolProps>> = {
  "air-vent": AirVentSymbol,
  "balancing-valve": BalancingValveSymbol,
  "boiler": BoilerSymbol,
  "buffer-vessel": BufferVesselSymbol,
  "check-valve": CheckValveSymbol,
  "cylinder": CylinderSymbol,
  "diverter-valve": DiverterValveSymbol,
  "dp-bypass-valve": DpBypassValveSymbol,
  "drain-cock": DrainCockSymbol,
  "expansion-vessel": ExpansionVesselSymbol,
  "fan-coil": FanCoilSymbol,
  "filling-loop": FillingLoopSymbol,
  "heat-load": HeatLoadSymbol,
  "heat-meter": HeatMeterSymbol,
  "heat-pump": HeatPumpSymbol,
  "isolation-valve": IsolationValveSymbol,
  "low-loss-header": LowLossHeaderSymbol,
  "magnetic-filter": MagneticFilterSymbol,
  "manifold": ManifoldSymbol,
  "pressure-gauge": PressureGaugeSymbol,
  "pump": PumpSymbol,
  "radiator": RadiatorSymbol,
  "safety-valve": SafetyValveSymbol,
  "strainer": StrainerSymbol,
  "tee": TeeSymbol,
  "temperature-sensor": TemperatureSensorSymbol,
  "ufh-loop": UfhLoopSymbol,
  "zone-valve": ZoneValveSymbol,
};
export { layoutOf } from "./layout";
export type { SymbolLayout } from "./layout";

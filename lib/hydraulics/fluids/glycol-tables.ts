/**
 * Glycol–water property tables by VOLUME percent of glycol, at 1–2 bar.
 *
 * Source: ASHRAE Handbook—Fundamentals 2001, chapter "Physical Properties of
 * Secondary Coolants (Brines)" (ch. 21 in 2001 from memory; ch. 31 in the 2009–2021
 * eds.), propylene/ethylene glycol tables by volume, as
 * represented by the ASHRAE-2001 polynomial fits shipped in CoolProp 8.0.0
 * (`INCOMP::APG`, `INCOMP::AEG`, volume-fraction based, fit validity 10–60 % vol,
 * −35…100 °C above freezing). Values were evaluated from those fits when this
 * table was made (rounded: ρ 0.1 kg/m³, cp 1 J/(kg·K), μ 4 significant digits).
 * references.md §2.2 confirms the PG density/cp cells at 0/10/20/40 °C against a
 * published reproduction of the ASHRAE PG table (±0.1 kg/m³, ±5 J/(kg·K)).
 * `null` = below the freezing point (no liquid) or outside the fit.
 * The 0 % row is not tabulated: the engine uses IAPWS water (water.ts).
 */

export const GLYCOL_TABLE_PERCENTS = [10, 20, 30, 40, 50] as const;
export const GLYCOL_TABLE_TEMPS_C = [-10, 0, 10, 20, 30, 40, 50, 60, 70, 80, 90] as const;

export type GlycolTable = readonly (readonly (number | null)[])[];

export interface GlycolDataset {
  /** Density, kg/m³; rows = GLYCOL_TABLE_PERCENTS, columns = GLYCOL_TABLE_TEMPS_C. */
  densityKgM3: GlycolTable;
  /** Isobaric specific heat, J/(kg·K). */
  specificHeatJkgK: GlycolTable;
  /** Dynamic viscosity, mPa·s. */
  viscosityMpas: GlycolTable;
  /** Freezing point, °C, at 0, 10, 20, 30, 40, 50 % vol (0 % = water). */
  freezingPointC: readonly number[];
}

export const propyleneGlycolByVolume: GlycolDataset = {
  densityKgM3: [
    [null, 1013.9, 1011.2, 1008.1, 1004.5, 1000.5, 995.9, 990.8, 985.3, 979.2, 972.7],
    [null, 1025.8, 1022.7, 1019.0, 1014.8, 1010.2, 1005.0, 999.3, 993.1, 986.4, 979.3],
    [1039.4, 1036.2, 1032.5, 1028.3, 1023.6, 1018.4, 1012.7, 1006.4, 999.7, 992.4, 984.7],
    [1048.8, 1045.1, 1040.9, 1036.2, 1031.0, 1025.3, 1019.1, 1012.3, 1005.0, 997.2, 988.9],
    [1056.9, 1052.7, 1048.0, 1042.9, 1037.2, 1031.0, 1024.3, 1017.0, 1009.3, 1001.0, 992.3],
  ],
  specificHeatJkgK: [
    [null, 4042, 4058, 4075, 4091, 4107, 4123, 4139, 4155, 4171, 4187],
    [null, 3929, 3951, 3973, 3994, 4016, 4038, 4060, 4082, 4104, 4126],
    [3766, 3793, 3820, 3848, 3875, 3903, 3930, 3958, 3985, 4013, 4040],
    [3603, 3636, 3669, 3702, 3735, 3768, 3801, 3834, 3867, 3900, 3933],
    [3416, 3455, 3493, 3532, 3571, 3609, 3648, 3686, 3725, 3763, 3802],
  ],
  viscosityMpas: [
    [null, 2.614, 1.9, 1.433, 1.117, 0.8956, 0.7363, 0.6183, 0.5281, 0.4571, 0.3994],
    [null, 4.078, 2.783, 1.996, 1.496, 1.165, 0.9387, 0.7776, 0.6588, 0.5678, 0.4951],
    [12.24, 7.232, 4.571, 3.069, 2.176, 1.618, 1.254, 1.006, 0.8299, 0.6997, 0.5989],
    [22.12, 12.19, 7.249, 4.623, 3.137, 2.249, 1.691, 1.323, 1.071, 0.8894, 0.7526],
    [35.72, 18.78, 10.73, 6.6, 4.344, 3.034, 2.232, 1.717, 1.37, 1.126, 0.9453],
  ],
  freezingPointC: [0, -3.43, -7.38, -13.11, -21.51, -33.66],
};

export const ethyleneGlycolByVolume: GlycolDataset = {
  densityKgM3: [
    [null, 1018.7, 1016.3, 1013.3, 1009.9, 1006.0, 1001.6, 996.7, 991.4, 985.5, 979.2],
    [null, 1035.7, 1032.9, 1029.7, 1026.0, 1021.8, 1017.2, 1012.0, 1006.4, 1000.2, 993.6],
    [1054.3, 1051.8, 1048.8, 1045.2, 1041.3, 1036.8, 1031.8, 1026.4, 1020.4, 1014.0, 1007.1],
    [1069.6, 1066.8, 1063.5, 1059.7, 1055.4, 1050.6, 1045.4, 1039.6, 1033.4, 1026.6, 1019.4],
    [1084.2, 1081.1, 1077.5, 1073.3, 1068.7, 1063.7, 1058.1, 1052.0, 1045.5, 1038.5, 1031.0],
  ],
  specificHeatJkgK: [
    [null, 3937, 3954, 3972, 3989, 4007, 4024, 4042, 4059, 4077, 4094],
    [null, 3769, 3792, 3815, 3838, 3861, 3884, 3907, 3930, 3953, 3976],
    [3560, 3589, 3617, 3645, 3674, 3702, 3730, 3759, 3787, 3815, 3844],
    [3367, 3401, 3435, 3468, 3502, 3535, 3569, 3602, 3636, 3669, 3703],
    [3165, 3203, 3242, 3281, 3319, 3358, 3396, 3435, 3474, 3512, 3551],
  ],
  viscosityMpas: [
    [null, 2.056, 1.564, 1.221, 0.9761, 0.7987, 0.6677, 0.5693, 0.4943, 0.4365, 0.3914],
    [null, 3.009, 2.195, 1.666, 1.309, 1.06, 0.8798, 0.7448, 0.6399, 0.5553, 0.4842],
    [6.256, 4.154, 2.92, 2.156, 1.662, 1.326, 1.089, 0.9124, 0.775, 0.6625, 0.5659],
    [9.296, 5.953, 4.062, 2.93, 2.215, 1.741, 1.411, 1.17, 0.9832, 0.8312, 0.7009],
    [13.27, 8.279, 5.512, 3.884, 2.873, 2.213, 1.761, 1.435, 1.189, 0.9928, 0.8289],
  ],
  freezingPointC: [0, -3.62, -8.98, -15.7, -24.8, -37.11],
};

/** The citation shown with glycol mixture properties. */
export const GLYCOL_SOURCE =
  "ASHRAE Handbook—Fundamentals 2001, ch. 21 propylene/ethylene glycol tables by volume (ASHRAE-2001 fits), interpolated; IAPWS water as the 0 % row";

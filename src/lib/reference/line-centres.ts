/** An atmospheric absorption line centre used for orientation in the lane view. */
export interface LineCentre {
  species: string;
  centreGHz: number;
  /** Where the value comes from. */
  source: string;
}

/**
 * Line centres of the 100–350 GHz sounding range (plus the 22 GHz water
 * line and the 380 GHz edge line as references), as tabulated in
 * Recommendation ITU-R P.676 (line tables) and the JPL Submillimeter,
 * Millimeter and Microwave Spectral Line Catalog (Pickett et al., JQSRT 60,
 * 883 (1998)).
 */
export const LINE_CENTRES: readonly LineCentre[] = [
  {
    species: "H2O",
    centreGHz: 22.23508,
    source: "ITU-R P.676 water-vapour line table (22.23507985 GHz in Tretyakov, JMS 328, 7 (2016))",
  },
  { species: "O2", centreGHz: 60.434776, source: "ITU-R P.676 oxygen line table (one line of the 50–70 GHz complex)" },
  { species: "O2", centreGHz: 118.750343, source: "ITU-R P.676 oxygen line table" },
  {
    species: "H2O",
    centreGHz: 183.310087,
    source: "ITU-R P.676 water-vapour line table; JPL catalogue tag 18003, 183310.087 MHz ± 0.001, 3(1,3)–2(2,0)",
  },
  { species: "H2O", centreGHz: 325.152888, source: "ITU-R P.676 water-vapour line table" },
  { species: "H2O", centreGHz: 380.197353, source: "ITU-R P.676 water-vapour line table" },
];

/**
 * The building codes a company can screen floors against: the live loads a house floor is designed
 * for, and the lowest presumptive bearing value of the ground under a slab. Values recalled are
 * marked "from memory"; the company's engineer and local codes decide.
 */

import { psfToKpa } from "./units";

export type RoomUse = "living" | "sleeping";
export type FloorCode = "us-irc" | "en-uk";
export const FLOOR_CODES: readonly FloorCode[] = ["us-irc", "en-uk"];
export const DEFAULT_FLOOR_CODE: FloorCode = "us-irc";

export interface FloorCodeValues {
  code: FloorCode;
  name: string;
  /** Uniformly distributed live load by room use, kPa. */
  liveLoadKPa: Record<RoomUse, number>;
  /** The same figures as the code prints them, for the sheet. */
  liveLoadPrinted: Record<RoomUse, string>;
  liveLoadSource: string;
  /** Concentrated live load the floor is designed for, kN; null where the code gives none for homes. */
  concentratedKN: number | null;
  /** Lowest presumptive (allowable) bearing value of soil the code lists, kPa. */
  lowestBearingKPa: number;
  lowestBearingPrinted: string;
  bearingSource: string;
}

/**
 * International Residential Code, Table R301.5 (minimum uniformly distributed live loads): rooms
 * other than sleeping rooms 40 psf, sleeping rooms 30 psf. Table R401.4.1 (presumptive load-bearing
 * values of foundation materials): the lowest class, clay, sandy clay, silty clay, clayey silt, silt
 * and sandy silt (CL, ML, MH, CH), 1,500 psf. Both from memory.
 */
export const IRC_LIVE_LOAD_PSF: Record<RoomUse, number> = { living: 40, sleeping: 30 };
export const IRC_LOWEST_BEARING_PSF = 1500;

/**
 * EN 1991-1-1 with the UK National Annex (NA to BS EN 1991-1-1, Table NA.2, category A1, all
 * uses within self-contained dwellings): q_k = 1.5 kN/m² uniform, Q_k = 2.0 kN concentrated; the
 * same for living areas and bedrooms (from memory). The Eurocodes give no presumptive soil bearing
 * values; UK practice takes them from BS 8004 (Code of practice for foundations; the 1986 edition's
 * Table 1 of presumed allowable bearing values puts soft clays and silts below 75 kPa and firm clay
 * at 75–150 kPa; from memory): we use 75 kPa and say that soft or made ground isn't covered.
 */
export const EN_UK_UNIFORM_KPA = 1.5;
export const EN_UK_CONCENTRATED_KN = 2.0;
export const BS8004_LOWEST_BEARING_KPA = 75;

export const FLOOR_CODE_VALUES: Record<FloorCode, FloorCodeValues> = {
  "us-irc": {
    code: "us-irc",
    name: "US residential code (IRC)",
    liveLoadKPa: { living: psfToKpa(IRC_LIVE_LOAD_PSF.living), sleeping: psfToKpa(IRC_LIVE_LOAD_PSF.sleeping) },
    liveLoadPrinted: { living: "40 psf", sleeping: "30 psf" },
    liveLoadSource: "IRC Table R301.5 (from memory)",
    concentratedKN: null,
    lowestBearingKPa: psfToKpa(IRC_LOWEST_BEARING_PSF),
    lowestBearingPrinted: "1,500 psf",
    bearingSource: "IRC Table R401.4.1, clays and silts (from memory)",
  },
  "en-uk": {
    code: "en-uk",
    name: "EN 1991-1-1 with the UK National Annex",
    liveLoadKPa: { living: EN_UK_UNIFORM_KPA, sleeping: EN_UK_UNIFORM_KPA },
    liveLoadPrinted: { living: "1.5 kN/m²", sleeping: "1.5 kN/m²" },
    liveLoadSource: "EN 1991-1-1, UK NA Table NA.2, category A1 (from memory)",
    concentratedKN: EN_UK_CONCENTRATED_KN,
    lowestBearingKPa: BS8004_LOWEST_BEARING_KPA,
    lowestBearingPrinted: "75 kN/m²",
    bearingSource: "BS 8004, presumed allowable bearing value, firm clay lower limit (from memory)",
  },
};

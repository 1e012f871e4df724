/**
 * Unit conversions. Exact definitions where one exists (NIST SP 811, Appendix B.8); the
 * torque, power and pressure factors are the rounded values the trade quotes, so results
 * match the figures printed in service manuals.
 */

/** Exact: 1 in = 2.54 cm. */
export const MM_PER_IN = 25.4
/** Exact: 2.54³. */
export const CC_PER_IN3 = 16.387064
/** Exact (international pound). */
export const KG_PER_LB = 0.45359237
/** Exact: pound-force at standard gravity 9.80665 m/s². */
export const N_PER_LBF = 4.4482216152605
/** Mechanical horsepower, 550 ft·lbf/s, rounded as NIST SP 811 B.8 prints it; metric PS (735.5 W) is a different unit. */
export const W_PER_HP = 745.6999
/** Rounded as NIST SP 811 B.8 prints it. */
export const NM_PER_LBFFT = 1.355818
/** Rounded as NIST SP 811 B.8 prints it. */
export const KPA_PER_PSI = 6.894757
/** Exact. */
export const KPA_PER_BAR = 100

export const inToMm = (inches: number): number => inches * MM_PER_IN
export const mmToIn = (mm: number): number => mm / MM_PER_IN

export const in3ToCc = (in3: number): number => in3 * CC_PER_IN3
export const ccToIn3 = (cc: number): number => cc / CC_PER_IN3

export const hpToKw = (hp: number): number => (hp * W_PER_HP) / 1000
export const kwToHp = (kw: number): number => (kw * 1000) / W_PER_HP

export const lbfFtToNm = (lbfFt: number): number => lbfFt * NM_PER_LBFFT
export const nmToLbfFt = (nm: number): number => nm / NM_PER_LBFFT

export const psiToBar = (psi: number): number => (psi * KPA_PER_PSI) / KPA_PER_BAR
export const barToPsi = (bar: number): number => (bar * KPA_PER_BAR) / KPA_PER_PSI

export const lbfToN = (lbf: number): number => lbf * N_PER_LBF
export const nToLbf = (n: number): number => n / N_PER_LBF

/** Exact: 1 µin = 0.0254 µm. Surface finish (Ra) is often quoted in microinches in the trade. */
export const UM_PER_MICROINCH = 0.0254

export const microinchToUm = (microinch: number): number => microinch * UM_PER_MICROINCH
export const umToMicroinch = (um: number): number => um / UM_PER_MICROINCH

import { Dec } from './decimal.js'

/** Exact definitions from NIST SP 811 (Appendix B). */
export const KILOGRAMS_PER_POUND = Dec('0.45359237')
export const METRES_PER_FOOT = Dec('0.3048')
export const METRES_PER_INCH = Dec('0.0254')
export const STANDARD_GRAVITY = Dec('9.80665') // m/s^2, NIST SP 811

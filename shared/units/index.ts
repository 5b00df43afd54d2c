export * from './decimal.js'
export * from './factors.js'
export * from './systems.js'
export * from './rounding.js'

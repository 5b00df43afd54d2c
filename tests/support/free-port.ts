export { freePort } from '../../scripts/lib/free-port.js'

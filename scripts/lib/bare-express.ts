// The yardstick: Express answering a small JSON object and nothing else, in a process of its own like the app.
// Prints its port on the first line of stdout.
import type { AddressInfo } from 'node:net'
import express from 'express'

const app = express()
app.get('/bare', (_req, res) => {
  res.json({ ok: true, name: 'bare', figures: [1, 2, 3] })
})
const server = app.listen(0, '127.0.0.1', () => {
  console.log((server.address() as AddressInfo).port)
})
process.once('SIGTERM', () => server.close(() => process.exit(0)))

import { createServer, connect, type Server, type Socket } from 'node:net'
import type { AddressInfo } from 'node:net'

/**
 * A loopback TCP relay to PostgreSQL that a test can cut and restore, to see the app through
 * a database outage without stopping the cluster other test files share.
 */
export class TcpProxy {
  private server: Server | null = null
  private sockets = new Set<Socket>()
  port = 0

  constructor(
    private readonly targetHost: string,
    private readonly targetPort: number,
  ) {}

  async open(port = this.port) {
    if (this.server) return
    this.server = createServer((client) => {
      const upstream = connect(this.targetPort, this.targetHost)
      for (const socket of [client, upstream]) {
        this.sockets.add(socket)
        socket.on('close', () => this.sockets.delete(socket))
        socket.on('error', () => socket.destroy())
      }
      client.pipe(upstream).pipe(client)
      client.on('close', () => upstream.destroy())
      upstream.on('close', () => client.destroy())
    })
    await new Promise<void>((resolve) => this.server!.listen(port, '127.0.0.1', resolve))
    this.port = (this.server.address() as AddressInfo).port
  }

  /** Refuses new connections and drops every open one. */
  async cut() {
    for (const socket of this.sockets) socket.destroy()
    await new Promise<void>((resolve) => (this.server ? this.server.close(() => resolve()) : resolve()))
    this.server = null
  }
}

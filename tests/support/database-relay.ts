/**
 * A TCP relay between an app server and MariaDB that a test can cut and
 * restore: the database "goes away" for that app server only, while the
 * shared test server and MariaDB itself carry on.
 */
import net from "node:net";

export class DatabaseRelay {
  private server: net.Server | null = null;
  private sockets = new Set<net.Socket>();
  constructor(
    private target: { host: string; port: number },
    readonly port: number,
  ) {}

  /** A relay to the database of `databaseUrl`, and that URL pointed at the relay. */
  static to(
    databaseUrl: string,
    port: number,
  ): { relay: DatabaseRelay; relayedUrl: string } {
    const url = new URL(databaseUrl);
    const relay = new DatabaseRelay(
      { host: url.hostname, port: Number(url.port) },
      port,
    );
    url.port = String(port);
    return { relay, relayedUrl: url.toString() };
  }

  async up(): Promise<void> {
    this.server = net.createServer((client) => {
      const upstream = net.connect(this.target);
      for (const socket of [client, upstream]) {
        this.sockets.add(socket);
        socket.on("close", () => this.sockets.delete(socket));
        socket.on("error", () => socket.destroy());
      }
      client.pipe(upstream).pipe(client);
    });
    await new Promise<void>((resolve) =>
      this.server!.listen(this.port, "127.0.0.1", resolve),
    );
  }

  async down(): Promise<void> {
    for (const socket of this.sockets) socket.destroy();
    await new Promise<void>((resolve) =>
      this.server ? this.server.close(() => resolve()) : resolve(),
    );
    this.server = null;
  }
}

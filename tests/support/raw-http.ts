/**
 * A request with exactly the headers given, Host included (fetch always sends
 * the host it connects to): for tests of what the server does with a Host
 * header an attacker chose.
 */
import http from "node:http";

export interface RawAnswer {
  status: number;
  headers: http.IncomingHttpHeaders;
  body: string;
  /** The body's bytes as they came, never decompressed. */
  bytes: Buffer;
}

export function rawRequest(options: {
  /** Where to connect, e.g. the test app's base URL; the Host header is separate. */
  connectTo: string;
  method?: string;
  path: string;
  headers?: Record<string, string>;
  body?: string;
}): Promise<RawAnswer> {
  const target = new URL(options.connectTo);
  return new Promise((resolve, reject) => {
    const request = http.request(
      {
        host: target.hostname,
        port: target.port,
        method: options.method ?? "GET",
        path: options.path,
        headers: {
          ...(options.body === undefined
            ? {}
            : { "Content-Length": Buffer.byteLength(options.body) }),
          ...options.headers,
        },
        setHost: !options.headers?.Host,
      },
      (response) => {
        const chunks: Buffer[] = [];
        response.on("data", (chunk: Buffer) => chunks.push(chunk));
        response.on("end", () => {
          const bytes = Buffer.concat(chunks);
          resolve({
            status: response.statusCode ?? 0,
            headers: response.headers,
            body: bytes.toString("utf8"),
            bytes,
          });
        });
        response.on("error", reject);
      },
    );
    request.on("error", reject);
    request.end(options.body);
  });
}

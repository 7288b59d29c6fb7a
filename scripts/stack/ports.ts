import net from "node:net";

/** Resolves true when nothing listens on 127.0.0.1:port (we could bind it). */
export function isPortFree(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const server = net.createServer();
    server.once("error", () => resolve(false));
    server.listen({ host: "127.0.0.1", port, exclusive: true }, () => server.close(() => resolve(true)));
  });
}

/** Throws a clear error when the port is taken, naming the setting that moves it. */
export async function assertPortFree(port: number, what: string, envName: string): Promise<void> {
  if (!(await isPortFree(port))) {
    throw new Error(
      `port ${port} for ${what} is already in use on 127.0.0.1 (another Peelform stack or program?). ` +
        `Stop it, or choose another port with ${envName}=…`,
    );
  }
}

/** Polls a TCP port until it accepts connections or `timeoutMs` passes. */
export async function waitForPort(port: number, timeoutMs: number): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const open = await new Promise<boolean>((resolve) => {
      const socket = net.connect({ host: "127.0.0.1", port });
      socket.once("connect", () => {
        socket.destroy();
        resolve(true);
      });
      socket.once("error", () => resolve(false));
    });
    if (open) return;
    if (Date.now() > deadline) throw new Error(`nothing answered on 127.0.0.1:${port} within ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

import net from 'node:net';

export function isPortFree(port: number, host = '127.0.0.1'): Promise<boolean> {
  return new Promise((resolve) => {
    const probe = net.createServer();
    probe.once('error', () => resolve(false));
    probe.listen(port, host, () => probe.close(() => resolve(true)));
  });
}

/** A free loopback port chosen by the kernel (for throwaway test services). */
export function anyFreePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = net.createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const address = probe.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      probe.close(() => resolve(port));
    });
  });
}

export async function requireFreePort(port: number, what: string, variable: string): Promise<void> {
  if (!(await isPortFree(port))) {
    throw new Error(`Port ${port} (${what}) is already in use on 127.0.0.1. Stop the program using it, or set ${variable} to another port.`);
  }
}

import net from 'node:net';

/** Resolves when the port can be bound on loopback, rejects naming the port otherwise. */
export function assertPortFree(port, what) {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.once('error', (error) =>
      reject(new Error(error.code === 'EADDRINUSE' ? `port ${port} (${what}) is already in use` : `${what} port ${port}: ${error.message}`)),
    );
    server.listen(port, '127.0.0.1', () => server.close(() => resolve()));
  });
}

export function freePort() {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address();
      server.close(() => resolve(port));
    });
  });
}

// A free TCP port on loopback: bind port 0, read what the OS chose, release it.
// (The server does not accept PORT=0, so tests pick the port themselves.)
import { createServer } from 'node:net';

export function freePort(): Promise<number> {
  return new Promise((resolvePort, reject) => {
    const srv = createServer();
    srv.unref();
    srv.on('error', reject);
    srv.listen(0, '127.0.0.1', () => {
      const addr = srv.address();
      const port = typeof addr === 'object' && addr ? addr.port : 0;
      srv.close(() => (port ? resolvePort(port) : reject(new Error('no port assigned'))));
    });
  });
}

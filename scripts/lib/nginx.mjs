// A load balancer on loopback for a venue network on one machine: Debian's nginx, round robin over
// server instances. Used by the scale test (test/support/scale-stack.ts) and the server bench.
import fs from 'node:fs';
import path from 'node:path';
import { ensureDebianPackage } from './debian.mjs';
import { startOwned, waitFor } from './processes.mjs';

const nginxBinary = () => (fs.existsSync('/usr/sbin/nginx') ? '/usr/sbin/nginx' : 'nginx');

/**
 * Round robin over the instances; a refused connection goes on to the next one, as a load balancer
 * in front of a rolling restart should. With `keepalive`, nginx keeps that many idle connections to
 * the instances open instead of one new connection per request.
 */
function nginxConfig({ dir, port, upstreams, keepalive }) {
  return `
${process.getuid?.() === 0 ? 'user root;' : ''}
worker_processes 1;
daemon off;
pid ${dir}/nginx.pid;
events { worker_connections 512; }
http {
  access_log off;
  client_body_temp_path ${dir}/body;
  proxy_temp_path ${dir}/proxy;
  fastcgi_temp_path ${dir}/fastcgi;
  uwsgi_temp_path ${dir}/uwsgi;
  scgi_temp_path ${dir}/scgi;
  client_max_body_size 30m;
  upstream mantlepiece {
${upstreams.map((upstream) => `    server 127.0.0.1:${upstream} max_fails=1 fail_timeout=10s;`).join('\n')}
${keepalive ? `    keepalive ${keepalive};` : ''}
  }
  server {
    listen 127.0.0.1:${port};
    location / {
      proxy_pass http://mantlepiece;
${keepalive ? '      proxy_http_version 1.1;\n      proxy_set_header Connection "";' : ''}
      proxy_set_header Host $http_host;
      proxy_set_header X-Forwarded-For $proxy_add_x_forwarded_for;
      proxy_set_header X-Forwarded-Proto $scheme;
      proxy_next_upstream error timeout http_502;
    }
  }
}
`;
}

/**
 * nginx on 127.0.0.1:`port` in front of the instances on `upstreams`, its configuration and
 * temporary files in `dir`; installed from Debian first when missing. Resolves once a request
 * through it reaches an instance's /api/health.
 */
export async function startNginx({ dir, port, upstreams, keepalive = 0 }) {
  ensureDebianPackage({ command: 'nginx', pkg: 'nginx', phaseName: 'load balancer' });
  fs.mkdirSync(dir, { recursive: true });
  fs.writeFileSync(path.join(dir, 'nginx.conf'), nginxConfig({ dir, port, upstreams, keepalive }));
  const nginx = startOwned('nginx', nginxBinary(), ['-c', path.join(dir, 'nginx.conf'), '-p', dir, '-e', path.join(dir, 'nginx-error.log')]);
  try {
    await waitFor(async () => (await fetch(`http://127.0.0.1:${port}/api/health`)).ok, {
      what: 'nginx', timeoutMs: 15_000,
      failIf: () => (nginx.child.exitCode !== null ? `nginx exited: ${nginx.recentOutput().trim()}` : null),
    });
  } catch (error) {
    await nginx.stop();
    throw error;
  }
  return nginx;
}

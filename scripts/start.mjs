// `npm start`: the whole of Mantlepiece on this machine, until Ctrl-C.
import path from 'node:path';
import { phase } from './lib/phase.mjs';
import { ensureDependencies, root, startStack } from './lib/stack.mjs';

const demoPassword = process.env.DEMO_PASSWORD ?? 'mantlepiece-demo';
const nodeEnv = process.env.NODE_ENV ?? 'development';

let stack;
let stopping = false;
async function shutdown(code) {
  if (stopping) return;
  stopping = true;
  phase('stopping', 'server, SMTP stand-in, MariaDB');
  await stack?.stop();
  process.exit(code);
}
process.on('SIGINT', () => shutdown(0));
process.on('SIGTERM', () => shutdown(0));

try {
  ensureDependencies();
  stack = await startStack({
    dataDir: path.resolve(root, process.env.DATA_DIR ?? '.data'),
    dbPort: Number(process.env.DB_PORT ?? 3307),
    smtpPort: Number(process.env.SMTP_PORT ?? 2525),
    port: Number(process.env.PORT ?? 4310),
    demoPassword,
    nodeEnv,
    echoServer: true,
  });
  phase('ready', stack.url);
  console.log(`
  Studio   ${stack.url}/
  Kiosk    ${stack.url}/kiosk/
  API docs ${stack.url}/api/docs
`);
  if (nodeEnv !== 'production') {
    console.log(`  Demo accounts (password: ${demoPassword}):
    admin@demo.test        organisation admin, every venue
    Basalt Point Earth Science Centre:
      curator@demo.test  educator@demo.test  translator@demo.test (fr, es)  technician@demo.test
    Cinder Hollow Volcano House:
      curator2@demo.test  educator@demo.test (a member of both venues)

  Press Ctrl-C to stop.`);
  }
  for (const proc of stack.processes) {
    proc.exited.then(({ code, signal }) => {
      if (stopping) return;
      console.error(`${proc.name} stopped unexpectedly (${signal ?? `exit ${code}`})\n${proc.recentOutput().slice(-2000)}`);
      shutdown(1);
    });
  }
} catch (error) {
  console.error(`\n✖ ${error.message}`);
  await shutdown(1);
}

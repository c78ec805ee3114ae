import 'reflect-metadata';
import type { AddressInfo } from 'node:net';
import { createApp } from './app.factory.js';
import { DEMO_PEOPLE } from './demo/demo-people.js';
import { databaseLabel } from './database/data-source.js';

const { app, config } = await createApp();
await app.listen(config.port, config.host);
// PORT=0 picks a free port (the browser tests use it), so print the one really bound.
const { port } = app.getHttpServer().address() as AddressInfo;
const url = `http://${config.host === '127.0.0.1' || config.host === '0.0.0.0' ? 'localhost' : config.host}:${port}`;
const lines = [`Homeground is running at ${url}  (API docs: ${url}/api/docs)`, `Database: ${databaseLabel(config)}`];
if (config.demoData) {
  lines.push('Demo sign-ins (invented people of the Larkfield Commons Growers; they never work in production):');
  for (const p of DEMO_PEOPLE) lines.push(`  ${p.email.padEnd(32)} ${p.password.padEnd(18)} ${p.note}`);
}
console.log(lines.join('\n'));

import net from 'node:net';
// Prints a port that was free a moment ago on 127.0.0.1. Written as plain text, not with console.log: under
// FORCE_COLOR (set in Playwright's workers) console.log prints a number wrapped in colour codes, which
// `next start -p` then refuses as "not a non-negative number".
const srv = net.createServer();
srv.listen(0, '127.0.0.1', () => {
  process.stdout.write(`${srv.address().port}\n`);
  srv.close();
});

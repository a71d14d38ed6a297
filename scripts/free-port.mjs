import net from 'node:net';
// Prints a port that was free a moment ago on 127.0.0.1.
const srv = net.createServer();
srv.listen(0, '127.0.0.1', () => {
  console.log(srv.address().port);
  srv.close();
});

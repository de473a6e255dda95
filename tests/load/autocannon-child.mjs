// One autocannon run in a process of its own, so that two runs at once (health while evaluate is saturated) do not
// share one event loop: in one process the busier run starved the other's sockets and its requests timed out on the
// client side, with the server idle for them. Options arrive as JSON on argv[2]; the answer is one JSON line on stdout.
import autocannon from 'autocannon';

const options = JSON.parse(process.argv[2]);
const latencies = [];
const instance = autocannon(options, (error, result) => {
  if (error) {
    console.error(error);
    process.exit(1);
  }
  process.stdout.write(`${JSON.stringify({ latencies, seconds: result.duration, errors: result.errors, timeouts: result.timeouts, non2xx: result.non2xx })}\n`);
});
instance.on('response', (_client, _status, _bytes, responseTime) => latencies.push(responseTime));

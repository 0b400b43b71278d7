// Preloaded into every server a bench measures (`node -r probe.cjs`, forked with an IPC channel): answers
// 'probe' with the process's own CPU time (process.cpuUsage) and memory (process.memoryUsage), so a bench
// reads the server's CPU µs per request and which kind of memory grows without touching the server's code.
if (process.send) {
  process.on('message', (msg) => {
    if (msg === 'probe') process.send({ probe: { cpu: process.cpuUsage(), mem: process.memoryUsage(), atUs: Number(process.hrtime.bigint() / 1000n) } });
    if (msg === 'gc' && global.gc) global.gc();
    // A clean exit, so `node --cpu-prof` writes its profile (a signal would end the process without it).
    if (msg === 'exit') process.exit(0);
  });
  // The channel must not keep a server alive that is asked to stop.
  process.channel?.unref();
}

/**
 * Preloaded into the benchmarked server (node --import): answers the bench's IPC messages
 * "memory" with process.memoryUsage() and "cpu" with process.cpuUsage(), so heap, PGlite's
 * WebAssembly memory (counted in `external`) and the server's own CPU time can be read from
 * outside without a route in the app. Only the bench loads it.
 */
process.on("message", (message) => {
  if (message === "memory") process.send?.({ memory: process.memoryUsage() });
  if (message === "cpu") process.send?.({ cpu: process.cpuUsage() });
});
// The IPC channel must not keep a stopping server alive.
process.channel?.unref();

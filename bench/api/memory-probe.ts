/**
 * Preloaded into the benchmarked server (node --import): answers the bench's IPC message
 * "memory" with process.memoryUsage(), so heap and PGlite's WebAssembly memory (counted in
 * `external`) can be read from outside without a route in the app. Only the bench loads it.
 */
process.on("message", (message) => {
  if (message === "memory") process.send?.({ memory: process.memoryUsage() });
});
// The IPC channel must not keep a stopping server alive.
process.channel?.unref();

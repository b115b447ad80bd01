// Preloaded into the server by `npm run load` only (never by npm start or npm test): SIGUSR2
// makes the process collect its garbage in full, so a memory figure counts what the process
// holds, not what its collector has yet to free.
const v8 = require("node:v8");
const vm = require("node:vm");
v8.setFlagsFromString("--expose-gc");
const gc = vm.runInNewContext("gc");
process.on("SIGUSR2", () => {
  gc();
  gc();
});

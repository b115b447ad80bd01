// Loads .env.local into process.env for scripts run outside Next (which loads it itself).
import { existsSync, readFileSync } from "node:fs";

export function loadEnvFile(path = ".env.local"): void {
  if (!existsSync(path)) return;
  for (const line of readFileSync(path, "utf8").split("\n")) {
    const m = /^\s*([A-Z0-9_]+)\s*=\s*(.*)\s*$/.exec(line);
    if (!m || m[1] === undefined || m[2] === undefined) continue;
    let value = m[2];
    if (value.startsWith('"') && value.endsWith('"')) value = value.slice(1, -1);
    process.env[m[1]] ??= value;
  }
}

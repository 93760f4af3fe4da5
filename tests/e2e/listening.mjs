// Starts one of the project's servers and waits for the line it prints once it listens
// (`listening on http://ADDR`); shared by the end-to-end scripts.

import { spawn } from "node:child_process";

/**
 * Spawns `program` with `args`; `ready` resolves with { proc, url } once it listens, and
 * rejects if it exits first or says nothing within 30 s.
 */
export function startListening(program, args, what) {
  const proc = spawn(program, args, { stdio: ["ignore", "pipe", "inherit"] });
  const ready = new Promise((resolve, reject) => {
    let out = "";
    const timer = setTimeout(() => reject(new Error(`${what} did not start in 30 s`)), 30000);
    proc.on("error", reject);
    proc.on("exit", (code) => reject(new Error(`${what} exited with ${code}`)));
    proc.stdout.on("data", (chunk) => {
      out += chunk;
      const m = out.match(/listening on (http:\/\/\S+)/);
      if (m) {
        clearTimeout(timer);
        resolve({ proc, url: m[1] });
      }
    });
  });
  return { proc, ready };
}

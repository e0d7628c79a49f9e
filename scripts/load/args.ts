// Settings of `npm run load`: arguments win over environment variables, which
// win over the defaults of issue 6 (30 s, 50 CI clients, 20 readers).

export interface LoadSettings {
  durationSeconds: number;
  ciClients: number;
  readers: number;
  /** Per-request client timeout; a timed-out request counts as an error. */
  timeoutSeconds: number;
  /** Distinct submission bodies generated before the load (commits differ per request anyway). */
  poolSize: number;
  /** Branches the CI clients spread their builds over. */
  branches: number;
}

const OPTIONS: Record<string, { env: string; key: keyof LoadSettings; fallback: number; min: number }> = {
  "--duration": { env: "LOAD_DURATION", key: "durationSeconds", fallback: 30, min: 1 },
  "--ci": { env: "LOAD_CI_CLIENTS", key: "ciClients", fallback: 50, min: 1 },
  "--readers": { env: "LOAD_READERS", key: "readers", fallback: 20, min: 0 },
  "--timeout": { env: "LOAD_TIMEOUT", key: "timeoutSeconds", fallback: 30, min: 1 },
  "--pool": { env: "LOAD_POOL", key: "poolSize", fallback: 60, min: 1 },
  "--branches": { env: "LOAD_BRANCHES", key: "branches", fallback: 5, min: 1 },
};

export const USAGE = `usage: npm run load -- [--duration S] [--ci N] [--readers N] [--timeout S] [--pool N] [--branches N]
  defaults: ${Object.entries(OPTIONS).map(([flag, o]) => `${flag} ${o.fallback} (${o.env})`).join(", ")}`;

export function parseLoadSettings(argv: string[], env: NodeJS.ProcessEnv): LoadSettings {
  const settings = Object.fromEntries(Object.values(OPTIONS).map((o) => [o.key, o.fallback])) as unknown as LoadSettings;
  for (const o of Object.values(OPTIONS)) {
    if (env[o.env] !== undefined && env[o.env] !== "") settings[o.key] = readNumber(env[o.env]!, o.env, o.min);
  }
  for (let i = 0; i < argv.length; i++) {
    const [flag, inline] = argv[i].split("=", 2);
    const o = OPTIONS[flag];
    if (!o) throw new Error(`unknown argument ${argv[i]}\n${USAGE}`);
    const value = inline ?? argv[++i];
    if (value === undefined) throw new Error(`${flag} needs a value\n${USAGE}`);
    settings[o.key] = readNumber(value, flag, o.min);
  }
  return settings;
}

function readNumber(text: string, name: string, min: number): number {
  const n = Number(text);
  if (!Number.isInteger(n) || n < min) throw new Error(`${name} must be a whole number ≥ ${min}, got "${text}"\n${USAGE}`);
  return n;
}

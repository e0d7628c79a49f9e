import { readFileSync, readdirSync, readlinkSync } from "node:fs";

// Finds the process serving a local TCP port and reads its resident set, for
// tests that must show the server did not hold a request body in memory.
// Linux only (/proc), like the rest of the test stack.

function listeningInodes(port: number): Set<string> {
  const inodes = new Set<string>();
  const hexPort = port.toString(16).toUpperCase().padStart(4, "0");
  for (const table of ["/proc/net/tcp", "/proc/net/tcp6"]) {
    let text = "";
    try {
      text = readFileSync(table, "utf8");
    } catch {
      continue;
    }
    for (const line of text.split("\n").slice(1)) {
      const fields = line.trim().split(/\s+/);
      // local_address is ADDR:PORT in hex; state 0A is LISTEN; field 9 is the inode.
      if (fields.length > 9 && fields[1].endsWith(`:${hexPort}`) && fields[3] === "0A") inodes.add(fields[9]);
    }
  }
  return inodes;
}

/** The pid of the process listening on `port` on this machine. */
export async function listeningPid(port: string | number): Promise<number> {
  const inodes = listeningInodes(Number(port));
  if (inodes.size === 0) throw new Error(`nothing listens on port ${port}`);
  for (const entry of readdirSync("/proc")) {
    if (!/^\d+$/.test(entry)) continue;
    let fds: string[] = [];
    try {
      fds = readdirSync(`/proc/${entry}/fd`);
    } catch {
      continue;
    }
    for (const fd of fds) {
      try {
        const target = readlinkSync(`/proc/${entry}/fd/${fd}`);
        const inode = /^socket:\[(\d+)\]$/.exec(target)?.[1];
        if (inode && inodes.has(inode)) return Number(entry);
      } catch {
        // the descriptor closed while we looked
      }
    }
  }
  throw new Error(`no process visible to this user owns the socket on port ${port}`);
}

/** The process's current resident set size in bytes (VmRSS). */
export function readRssBytes(pid: number): number {
  const status = readFileSync(`/proc/${pid}/status`, "utf8");
  const kb = /^VmRSS:\s+(\d+)\s+kB$/m.exec(status)?.[1];
  if (!kb) throw new Error(`no VmRSS for pid ${pid}`);
  return Number(kb) * 1024;
}

/**
 * The file the process (or the nearest ancestor, for `next dev`'s worker)
 * writes its standard output to: the server's log. Null when it goes to a
 * terminal or pipe all the way up.
 */
export function serverLogPath(pid: number): string | null {
  let current = pid;
  for (let hops = 0; hops < 5 && current > 1; hops++) {
    try {
      const target = readlinkSync(`/proc/${current}/fd/1`);
      if (target.startsWith("/") && !target.startsWith("/dev/")) return target;
      const parent = /^PPid:\s+(\d+)$/m.exec(readFileSync(`/proc/${current}/status`, "utf8"))?.[1];
      current = Number(parent ?? 0);
    } catch {
      return null;
    }
  }
  return null;
}

import { readFileSync, readdirSync } from "node:fs";

/** Resident memory (bytes) of a process and all its descendants, from /proc (Linux). */
export function treeRssBytes(rootPid: number): number {
  const children = new Map<number, number[]>();
  const rss = new Map<number, number>();
  for (const entry of readdirSync("/proc")) {
    if (!/^\d+$/.test(entry)) continue;
    try {
      const status = readFileSync(`/proc/${entry}/status`, "utf8");
      const ppid = Number(/^PPid:\s+(\d+)/m.exec(status)?.[1]);
      const kb = Number(/^VmRSS:\s+(\d+) kB/m.exec(status)?.[1] ?? 0);
      rss.set(Number(entry), kb * 1024);
      children.set(ppid, [...(children.get(ppid) ?? []), Number(entry)]);
    } catch {
      // the process ended while we looked
    }
  }
  let total = 0;
  const stack = [rootPid];
  while (stack.length) {
    const pid = stack.pop() as number;
    total += rss.get(pid) ?? 0;
    stack.push(...(children.get(pid) ?? []));
  }
  return total;
}

/** Resident memory of a process group (the `next start` leader and every process under it), in bytes. */
export function processGroupRssBytes(groupId: number): number {
  let total = 0;
  for (const entry of readdirSync("/proc")) {
    if (!/^\d+$/.test(entry)) continue;
    try {
      const stat = readFileSync(`/proc/${entry}/stat`, "utf8");
      // Fields after the command name in parentheses: state, ppid, pgrp (proc(5)).
      const [, , pgrp] = stat.slice(stat.lastIndexOf(")") + 2).split(" ");
      if (Number(pgrp) !== groupId) continue;
      const rss = /^VmRSS:\s+(\d+) kB/m.exec(readFileSync(`/proc/${entry}/status`, "utf8"));
      if (rss) total += Number(rss[1]) * 1024;
    } catch {
      // the process ended between the listing and the read
    }
  }
  return total;
}

// A CPU profile of this process while a load runs (node:inspector's Profiler), summarised as the
// functions with the most self time and the packages / project folders they belong to.
import { Session } from 'node:inspector/promises';
import path from 'node:path';

interface ProfileNode {
  id: number;
  callFrame: { functionName: string; url: string; lineNumber: number };
  hitCount?: number;
}
interface Profile {
  nodes: ProfileNode[];
  samples?: number[];
  timeDeltas?: number[];
}

export interface ProfileSummary {
  /** Milliseconds sampled in all. */
  totalMs: number;
  /** Top functions by self time: name, where, share of all samples. */
  functions: { name: string; where: string; share: number }[];
  /** Self time per package (node_modules/<name>), project folder or Node's internals. */
  groups: { group: string; share: number }[];
}

/** Where a frame's code lives: `pkg:<name>`, a project folder (`server/services`), `node` or `(vm)`. */
export function groupOf(url: string, root: string): string {
  if (!url) return '(native, GC, idle)';
  if (url.startsWith('node:')) return 'node (internals)';
  const file = url.startsWith('file://') ? new URL(url).pathname : url;
  const mod = file.lastIndexOf('/node_modules/');
  if (mod >= 0) {
    const rest = file.slice(mod + '/node_modules/'.length).split('/');
    return `pkg:${rest[0].startsWith('@') ? `${rest[0]}/${rest[1]}` : rest[0]}`;
  }
  const rel = path.relative(root, file);
  if (!rel.startsWith('..')) return path.dirname(rel);
  return file;
}

export async function profileWhile<T>(root: string, run: () => Promise<T>): Promise<{ result: T; summary: ProfileSummary }> {
  const session = new Session();
  session.connect();
  await session.post('Profiler.enable');
  await session.post('Profiler.setSamplingInterval', { interval: 200 });
  await session.post('Profiler.start');
  // Disconnecting ends the profiling too, so a failed load never leaves it running.
  try {
    const result = await run();
    const { profile } = (await session.post('Profiler.stop')) as { profile: Profile };
    return { result, summary: summarise(profile, root) };
  } finally {
    session.disconnect();
  }
}

export function summarise(profile: Profile, root: string, top = 15): ProfileSummary {
  const byId = new Map(profile.nodes.map((n) => [n.id, n]));
  // Self time per node from the samples and their time deltas (hitCount alone ignores the
  // sampling jitter).
  const selfUs = new Map<number, number>();
  const samples = profile.samples ?? [];
  const deltas = profile.timeDeltas ?? [];
  for (let i = 0; i < samples.length; i++) selfUs.set(samples[i], (selfUs.get(samples[i]) ?? 0) + (deltas[i + 1] ?? deltas[i] ?? 0));
  let total = 0;
  const fn = new Map<string, { name: string; where: string; us: number }>();
  const groups = new Map<string, number>();
  for (const [id, us] of selfUs) {
    const node = byId.get(id);
    if (!node) continue;
    total += us;
    const { functionName, url, lineNumber } = node.callFrame;
    const group = groupOf(url, root);
    const where = url ? `${group.startsWith('pkg:') ? `${group.slice(4)} ` : ''}${path.basename(url)}:${lineNumber + 1}` : '';
    const name = functionName || '(anonymous)';
    const key = `${name}|${where}`;
    const entry = fn.get(key) ?? { name, where, us: 0 };
    entry.us += us;
    fn.set(key, entry);
    groups.set(group, (groups.get(group) ?? 0) + us);
  }
  const share = (us: number) => Math.round((us / Math.max(total, 1)) * 1000) / 10;
  return {
    totalMs: Math.round(total / 1000),
    functions: [...fn.values()]
      .sort((a, b) => b.us - a.us)
      .slice(0, top)
      .map((f) => ({ name: f.name, where: f.where, share: share(f.us) })),
    groups: [...groups.entries()]
      .sort((a, b) => b[1] - a[1])
      .slice(0, top)
      .map(([group, us]) => ({ group, share: share(us) })),
  };
}

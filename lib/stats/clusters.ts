// Recurring-cause clusters: the same cause at the same place (site, car or lot)
// several times within a short time.

export type ClusterKeyKind = "site" | "car" | "lot";

export interface ClusterEvent {
  id: string;
  /** The site, car or lot the event belongs to. */
  key: string;
  cause: string;
  /** A Date or an ISO date string ("2025-03-14" or a full timestamp). */
  date: Date | string;
}

export interface ClusterOptions {
  keyKind: ClusterKeyKind;
  /** Members must fall within a window this many days long; default 30. */
  windowDays?: number;
  /** Fewest events that make a cluster; default 3 for a site, 2 for a car or lot. */
  minSize?: number;
}

export interface Cluster {
  key: string;
  cause: string;
  memberIds: string[];
  firstDate: Date;
  lastDate: Date;
}

const DAY_MS = 86_400_000;

function toDate(d: Date | string): Date {
  const date = d instanceof Date ? d : new Date(d);
  if (Number.isNaN(date.getTime())) throw new RangeError(`Not a date: ${String(d)}`);
  return date;
}

/**
 * Finds windows of at most `windowDays` (last minus first date) holding at least
 * `minSize` events of one cause at one key; overlapping windows merge into one cluster.
 */
export function findClusters(events: readonly ClusterEvent[], opts: ClusterOptions): Cluster[] {
  const windowDays = opts.windowDays ?? 30;
  const minSize = opts.minSize ?? (opts.keyKind === "site" ? 3 : 2);
  if (!(windowDays >= 0) || !(minSize >= 1)) throw new RangeError("windowDays must be >= 0 and minSize >= 1.");
  const groups = new Map<string, { event: ClusterEvent; time: number }[]>();
  for (const event of events) {
    const groupKey = JSON.stringify([event.key, event.cause]);
    const list = groups.get(groupKey) ?? [];
    list.push({ event, time: toDate(event.date).getTime() });
    groups.set(groupKey, list);
  }
  const clusters: Cluster[] = [];
  for (const list of groups.values()) {
    list.sort((a, b) => a.time - b.time || a.event.id.localeCompare(b.event.id));
    let current: { start: number; end: number } | null = null;
    const flush = () => {
      if (!current) return;
      const members = list.slice(current.start, current.end + 1);
      clusters.push({
        key: members[0].event.key,
        cause: members[0].event.cause,
        memberIds: members.map((m) => m.event.id),
        firstDate: new Date(members[0].time),
        lastDate: new Date(members[members.length - 1].time),
      });
      current = null;
    };
    let end = 0;
    for (let start = 0; start < list.length; start++) {
      if (end < start) end = start;
      while (end + 1 < list.length && list[end + 1].time - list[start].time <= windowDays * DAY_MS) end++;
      if (end - start + 1 < minSize) continue;
      if (current && start <= current.end) current.end = Math.max(current.end, end);
      else {
        flush();
        current = { start, end };
      }
    }
    flush();
  }
  return clusters.sort((a, b) => a.firstDate.getTime() - b.firstDate.getTime() || a.key.localeCompare(b.key));
}

import { linkSchema, networkSchema, nodeSchema, sourceSchema, type Network } from "./schema";
import { referenceIssues } from "./validate";

/** The first thing `networkSchema` finds wrong with a network: where, and what. */
export interface NetworkIssue {
  path: PropertyKey[];
  message: string;
}

type Element = Readonly<Record<string, unknown>>;

/** The same keys with the same values (the elements of a network hold only plain values); no key lists are built. */
function sameElement(a: Element, b: Element): boolean {
  let keys = 0;
  for (const k in a) {
    if (!Object.hasOwn(b, k) || !Object.is(a[k], b[k])) return false;
    keys++;
  }
  for (const k in b) if (Object.hasOwn(b, k)) keys--;
  return keys === 0;
}

const PARTS = [
  { key: "nodes", schema: nodeSchema },
  { key: "links", schema: linkSchema },
  { key: "sources", schema: sourceSchema },
] as const;

/**
 * `networkSchema.safeParse` for a series of networks that repeat one heat path with other
 * values (each mode of a build compiles the same path with its own heat). A network with
 * the ambient and as many nodes, links and sources as the last one that passed has only the
 * elements whose values changed parsed, each with the schema the network's applies to it,
 * then the reference checks the network's runs after them: the first issue is the one the
 * whole parse would report first, at the same path (an unchanged element passed before).
 * Anything else is parsed whole. The whole parse of a lamp's network costs a tenth of a
 * millisecond, an evaluation parses one per mode, and between modes only the heat changes.
 */
export class NetworkCheck {
  private passed: Network | null = null;

  /** The first issue, or null when the network passes. */
  firstIssue(network: Network): NetworkIssue | null {
    const issue = this.passed && this.sameShape(network, this.passed) ? this.changedIssue(network, this.passed) : this.wholeIssue(network);
    this.passed = issue ? null : network;
    return issue;
  }

  private wholeIssue(network: Network): NetworkIssue | null {
    const parsed = networkSchema.safeParse(network);
    const issue = parsed.success ? undefined : parsed.error.issues[0];
    return issue ? { path: issue.path, message: issue.message } : null;
  }

  private sameShape(network: Network, before: Network): boolean {
    return Object.is(network.ambientC, before.ambientC) && PARTS.every(({ key }) => Array.isArray(network[key]) && network[key].length === before[key].length);
  }

  private changedIssue(network: Network, before: Network): NetworkIssue | null {
    for (const { key, schema } of PARTS) {
      const now: readonly Element[] = network[key];
      const then: readonly Element[] = before[key];
      for (let i = 0; i < now.length; i++) {
        if (sameElement(now[i]!, then[i]!)) continue;
        const parsed = schema.safeParse(now[i]);
        const issue = parsed.success ? undefined : parsed.error.issues[0];
        if (issue) return { path: [key, i, ...issue.path], message: issue.message };
      }
    }
    const ref = referenceIssues(network)[0];
    return ref ? { path: ref.path, message: ref.message } : null;
  }
}

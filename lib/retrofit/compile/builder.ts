import type { Network, NetworkLink, NetworkNode, Trace } from "@/lib/thermal";
import type { ProblemList } from "../problems";

/** Names of the places the Budget screen shows; a node or link always maps to one of them. */
export const PLACES = {
  junction: "LED junction",
  solder: "emitter solder point",
  board: "emitter board",
  sink: "heatsink",
  air: "housing air",
  wall: "housing wall",
  wallEngine: "housing wall at the light engine",
  wallDriver: "housing wall at the driver",
  wallSecond: "housing wall, second material",
  driver: "driver board",
  cells: "cells",
  charger: "charger",
  ambient: "ambient air",
} as const;

export interface NodePlace {
  id: string;
  place: string;
  /** The build slot the node stands for, e.g. "lightEngine.heatsink". */
  slot: string;
  heatCapacityTrace?: Trace;
}

/** A link whose conductance a bench run of the finished build corrected (its design's calibration). */
export interface LinkCalibration {
  factor: number;
  parameter: "sink-rating" | "inside-air" | "outside-air";
  runTitle: string;
  readingCount: number;
}

export interface LinkPlace {
  index: number;
  from: string;
  to: string;
  /** What the link is, in the builder's words: "interface, board → heatsink". */
  place: string;
  slot: string;
  /** Trace from the element models at compile time; links whose value depends on temperature get theirs at the solution. */
  trace?: Trace;
  /** Set when the link's conductance is the model's times a fitted factor. */
  calibration?: LinkCalibration;
}

/** Accumulates nodes and links with their places, so the network and its map stay in step. */
export class NetworkBuilder {
  readonly nodes: NetworkNode[] = [];
  readonly links: NetworkLink[] = [];
  readonly nodePlaces: NodePlace[] = [];
  readonly linkPlaces: LinkPlace[] = [];

  constructor(
    readonly ambientC: number,
    readonly problems: ProblemList,
  ) {}

  node(id: string, place: string, slot: string, capacity?: { heatCapacityJPerK: number; trace: Trace }): string {
    this.nodes.push({ id, label: place, ...(capacity && capacity.heatCapacityJPerK > 0 ? { heatCapacityJPerK: capacity.heatCapacityJPerK } : {}) });
    this.nodePlaces.push({ id, place, slot, ...(capacity ? { heatCapacityTrace: capacity.trace } : {}) });
    return id;
  }

  has(id: string): boolean {
    return this.nodes.some((n) => n.id === id);
  }

  /** Adds a link, labelled with its place. `link` is a fresh object the network keeps (every caller writes it out in the call). */
  link(link: NetworkLink, place: string, slot: string, trace?: Trace): number {
    const index = this.links.length;
    link.label = place;
    this.links.push(link);
    this.linkPlaces.push({ index, from: link.from, to: link.to, place, slot, ...(trace ? { trace } : {}) });
    return index;
  }

  resistance(from: string, to: string, kelvinPerWatt: number, place: string, slot: string, trace: Trace): number {
    return this.link({ from, to, type: "resistance", kelvinPerWatt }, place, slot, trace);
  }

  network(sources: Network["sources"]): Network {
    return { ambientC: this.ambientC, nodes: this.nodes, links: this.links, sources };
  }
}

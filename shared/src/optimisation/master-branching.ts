import type { KitCut } from './daily-model.js';
import type { EnergyCut } from './energy-cuts.js';
import { alternativePresent, type IndexedAlternative, type PresolvedProblem } from './presolve.js';
import { keepCompiled, releaseCompiled } from '../jit/keep-compiled.js';

/**
 * The master problem of the kit search solved by a branch-and-bound of our own, in item counts, without an LP.
 *
 * Every row of the master but three kinds is upward closed — a kit that meets it still meets it with more of any item:
 * a device's paths, an energy cut (coefficients ≥ 0), a "no larger than" cut. So within a node (each count between a
 * floor and a ceiling) the kit at the floors is the lightest candidate, and it is the node's answer when it meets every
 * row. Otherwise the search picks a row the floor kit breaks and branches on the ways to meet it (raise one item, or
 * make one path present), the siblings kept apart where a way is a single item (a later sibling may not raise it).
 * The bound of a node is the floor kit's grams plus, over the rows it breaks, the most grams any one of them still
 * needs (a fractional knapsack for an energy cut). The rest: dominance rows tie an item's use to another's full count
 * (propagated on floors and ceilings), a "no superset of" cut and the gram cap prune, a "not exactly" cut branches
 * like a "no larger than" cut when the floor kit is that kit.
 * Memory: when the open nodes reach their limit, the search lets go of those with the highest bounds and goes on with
 * the rest (`maxOpenNodes`, `keptShareWhenFull`). The least bound it let go of is then a lower bound on every kit it
 * can no longer see, so an answer at or under it is still proven the lightest; one above it is the lightest of the
 * nodes kept, with that bound.
 * Source: branch and bound (A. H. Land and A. G. Doig, An automatic method of solving discrete programming problems,
 * Econometrica 28(3), 1960); branching on a violated covering row is the usual set-covering scheme (E. Balas and
 * A. Ho, Set covering algorithms using cutting planes, heuristics, and subgradient optimization, Mathematical
 * Programming Study 12, 1980).
 */

/** One master instance: the presolved problem with the search's cuts and an optional gram cap. */
export interface MasterInstance {
  pre: PresolvedProblem;
  cuts: readonly KitCut[];
  energyCuts: readonly EnergyCut[];
  maxMassG?: number;
}

/**
 * The answer: the lightest kit of the nodes kept (counts by item index) with a lower bound on every kit the cuts allow
 * (`lowerBoundG`: its own grams, so proven the lightest, unless the search let nodes go with lesser bounds, see
 * `maxOpenNodes`); none; gave up (node or time limit: ask the LP master); or too large (the search let nodes go and has
 * none left: what the model still allows is unknown).
 */
export type MasterAnswer =
  | { status: 'optimal'; counts: number[]; massG: number; lowerBoundG: number; nodes: number }
  | { status: 'infeasible'; nodes: number }
  | { status: 'gave-up'; nodes: number }
  | { status: 'too-large'; nodes: number };

/** Limits of one solve. */
export interface MasterLimits {
  /** Nodes before giving up (default `defaultMasterNodeLimit`). */
  nodeLimit?: number;
  /** Open nodes the search may hold before it lets those with the highest bounds go (default `maxOpenNodes`). */
  openLimit?: number;
  deadlineMs?: number;
  now?: () => number;
}

/** Nodes one master solve may open before the LP master takes over: about a second of search on this machine. */
export const defaultMasterNodeLimit = 2_000_000;

/**
 * Open nodes a search may hold, about 85 MB at 200 items (a floor and a ceiling of a byte per item, and 42 bytes of
 * fields each, in `NodeStore`; a 200-item locker held 2.3 GB after 30 s with four-byte counts and no cap). Past it the
 * search keeps `keptShareWhenFull` of them, those with the least bounds, and goes on. It used to stop there instead,
 * with the repairs of its last proposals as the answer: a 75-item locker over 30 nights (bench seed 301) stopped after
 * 4 rounds and answered 1,702 g, where letting go proves its 944 g optimum in 3.6 s, and four 100-item lockers that all
 * stopped unproven are now proven in 3–17 s (shared/README.md, Optimisation, **Letting nodes go**).
 */
export const maxOpenNodes = 200_000;

/**
 * The share of the open nodes a full search keeps (those with the least bounds); each letting-go sorts the open nodes,
 * so it comes at most once per a quarter of `maxOpenNodes` new ones. Tried on the lockers in shared/README.md
 * (Optimisation, **Letting nodes go**) at 20 s: with a quarter kept the 75-item locker's bound fell to 814 g, with half
 * to 940 g, with three quarters its 944 g is proven in 3.6 s (with 90 % in 4.7 s); the other kits and proofs are the
 * same at a half and three quarters, within 5–15 % of the time.
 */
export const keptShareWhenFull = 0.75;

/** Nodes let go whose bounds a full search brings up to date at most, each a node check (see `reboundLeast`). */
export const reboundLimitWhenFull = 20_000;

/**
 * Node bytes above which a search's closures are not kept compiled between plans (ours: the 50-item bench search holds
 * under 1 MB of nodes, a stopped 200-item one tens of MB).
 */
export const keptSearchBytes = 4_000_000;

/** Relative slack on an energy cut: a kit short by less than this share of the right-hand side meets it. */
const energySlack = 1e-9;

/** A way to meet a row: raise these items to at least these counts. */
type Raise = readonly (readonly [item: number, count: number])[];

/**
 * The items a node's floor packs (count > 0), listed once per check: a kit holds a few of a locker's items, so a row
 * that only asks whether the floor meets it looks at these instead of all of its own items.
 */
interface Packed {
  items: Int32Array;
  length: number;
}

/** A row in the branching form. */
interface CoverRow {
  /**
   * −1 when lb meets the row; otherwise at least the grams the lightest kit within [lb, ub] that meets it adds to lb's
   * (0 is possible: a broken row whose bound is optimistic), Infinity when no kit there meets it.
   */
  need(lb: Uint8Array, ub: Uint8Array, packed: Packed): number;
  /** The ways to meet the row from lb (only called when lb breaks it). Single-item ways are kept apart by `apart`. */
  raises(lb: Uint8Array, ub: Uint8Array): Raise[];
  /** An energy cut's row: its terms, and the Wh its last `need` found short (after the groups, counted optimistically). */
  energy?: EnergyTerms;
}

interface EnergyTerms {
  itemWh: Float64Array;
  targetWh: number;
  shortWh: number;
}

/** The cuts of one master solve (the search's cuts only grow between solves of one `MasterSearch`). */
export interface MasterCuts {
  cuts: readonly KitCut[];
  energyCuts: readonly EnergyCut[];
  maxMassG?: number;
}

/** A branch-and-bound search kept between the master solves of one kit search. */
export interface MasterSearch {
  /**
   * The lightest kit that meets every cut. The cuts passed must hold every cut of earlier calls (or cuts implying
   * them): the open nodes of earlier calls are reused, each re-bounded under the new cuts when it comes up.
   */
  next(cuts: MasterCuts, limits?: MasterLimits): MasterAnswer;
  /**
   * The same solve on a copy of the open nodes, leaving the kept tree as it was: for passing cuts ("not exactly", a gram
   * cap) that later solves must not inherit (a tie-break among kits of equal grams starts from where the search stands
   * instead of from the root). Its other cuts' rows are kept like `next`'s: pass only cuts every later solve holds.
   */
  peek(cuts: MasterCuts, limits?: MasterLimits): MasterAnswer;
}

/**
 * The open nodes, field by field in typed arrays indexed by node id. A node: every count between its floor `lb` and
 * ceiling `ub` (kept side by side in `counts`). `boundG` is a lower bound on the grams of any kit in it that meets the
 * rows born up to `seen` (−1: none checked yet, the bound is its parent's or its floor's); `broken` is one of those rows
 * its floor kit breaks, to branch on (null: the floor meets them all). Nodes as objects, each with two byte arrays, were
 * most of what the young generation copied: a 50-item plan opens about 13,500, most of which never come up.
 */
class NodeStore {
  /** Bytes per node in `counts`: the floor, then the ceiling. */
  private readonly width: number;
  private capacity: number;
  counts: Uint8Array;
  floorG: Float64Array;
  boundG: Float64Array;
  seen: Int32Array;
  /** Units packed at the floor (the heap's tie-break: nearer a leaf first). */
  units: Int32Array;
  /** Whether the node itself was checked (a child starts with its parent's `seen` and `pending`, its floor unchecked). */
  checked: Uint8Array;
  /**
   * Whether the floor breaks two or more energy rows whose surrogate (`surrogateNeedG`) the bound does not count yet: it
   * is worked out only when the node comes up to be split (see the search loop).
   */
  surrogateDue: Uint8Array;
  /** The solve a node was opened in (a copy's nodes are let go when it ends, see `peek`). */
  openedIn: Int32Array;
  /**
   * Rows born up to `seen` that the floor kit may still break (the rest it meets): a child's floor holds its parent's,
   * and every row is met by a larger kit if by a smaller (upward closed), so a child checks only the rows its parent
   * broke and those born since. Null: none.
   */
  pending: (readonly BornRow[] | null)[] = [];
  broken: (CoverRow | null)[] = [];
  private readonly free: number[] = [];
  private used = 0;

  constructor(private readonly n: number) {
    this.width = 2 * n;
    // Room for the nodes of a small search from the start (a gram price's search opens thousands; each doubling copies).
    this.capacity = 2048;
    this.counts = new Uint8Array(this.capacity * this.width);
    this.floorG = new Float64Array(this.capacity);
    this.boundG = new Float64Array(this.capacity);
    this.seen = new Int32Array(this.capacity);
    this.units = new Int32Array(this.capacity);
    this.checked = new Uint8Array(this.capacity);
    this.surrogateDue = new Uint8Array(this.capacity);
    this.openedIn = new Int32Array(this.capacity);
  }

  /** A node id for a new node with floor `lb` and ceiling `ub` (its other fields to be set by the caller). */
  open(lb: Uint8Array, ub: Uint8Array, solve: number): number {
    let id = this.free.pop();
    if (id === undefined) {
      if (this.used === this.capacity) this.grow();
      id = this.used++;
      this.pending.push(null);
      this.broken.push(null);
    }
    const at = id * this.width;
    this.counts.set(lb, at);
    this.counts.set(ub, at + this.n);
    this.checked[id] = 0;
    this.surrogateDue[id] = 0;
    this.openedIn[id] = solve;
    return id;
  }

  /** A copy of node `id` (a copied heap's nodes are copied before they change). */
  copy(id: number, solve: number): number {
    const at = id * this.width;
    const other = this.open(
      this.counts.subarray(at, at + this.n),
      this.counts.subarray(at + this.n, at + this.width),
      solve,
    );
    this.floorG[other] = this.floorG[id] as number;
    this.boundG[other] = this.boundG[id] as number;
    this.seen[other] = this.seen[id] as number;
    this.units[other] = this.units[id] as number;
    this.checked[other] = this.checked[id] as number;
    this.surrogateDue[other] = this.surrogateDue[id] as number;
    this.pending[other] = this.pending[id] ?? null;
    this.broken[other] = this.broken[id] ?? null;
    return other;
  }

  /** Copies node `id`'s floor and ceiling into `lb` and `ub`. */
  read(id: number, lb: Uint8Array, ub: Uint8Array): void {
    const at = id * this.width;
    const counts = this.counts;
    const n = this.n;
    for (let i = 0; i < n; i++) {
      lb[i] = counts[at + i] as number;
      ub[i] = counts[at + n + i] as number;
    }
  }

  /** Lets node `id` go: its id is reused. */
  close(id: number): void {
    this.pending[id] = null;
    this.broken[id] = null;
    this.free.push(id);
  }

  /** Bytes its node arrays take (the pending and broken lists' slots counted at a pointer each). */
  get bytes(): number {
    const typed = [this.counts, this.floorG, this.boundG, this.seen, this.units, this.checked, this.surrogateDue];
    return typed.reduce((sum, a) => sum + a.byteLength, this.openedIn.byteLength) + 16 * this.capacity;
  }

  private grow(): void {
    const capacity = 2 * this.capacity;
    const widen = <T extends Uint8Array | Int32Array | Float64Array>(a: T, make: (size: number) => T, per = 1): T => {
      const b = make(capacity * per);
      b.set(a);
      return b;
    };
    this.counts = widen(this.counts, (k) => new Uint8Array(k), this.width);
    this.floorG = widen(this.floorG, (k) => new Float64Array(k));
    this.boundG = widen(this.boundG, (k) => new Float64Array(k));
    this.seen = widen(this.seen, (k) => new Int32Array(k));
    this.units = widen(this.units, (k) => new Int32Array(k));
    this.checked = widen(this.checked, (k) => new Uint8Array(k));
    this.surrogateDue = widen(this.surrogateDue, (k) => new Uint8Array(k));
    this.openedIn = widen(this.openedIn, (k) => new Int32Array(k));
    this.capacity = capacity;
  }
}

/** A row with the number of its birth: a node checked up to birth b needs only the rows born later. */
interface BornRow {
  row: CoverRow;
  birth: number;
  /** A "no larger than" row: whether a floor meets it is read from `metBits` (see `createMasterSearch`). */
  byBits?: boolean;
}

/** A bit per row birth, growing as rows are born. */
class BirthBits {
  words = new Uint32Array(4);
  set(birth: number): void {
    const w = birth >>> 5;
    if (w >= this.words.length) {
      const grown = new Uint32Array(Math.max(w + 1, 2 * this.words.length));
      grown.set(this.words);
      this.words = grown;
    }
    this.words[w] = (this.words[w] as number) | (1 << (birth & 31));
  }
}

/**
 * Creates a master search over a presolved problem: best-first branch and bound whose open nodes carry over from one
 * solve to the next (cuts only remove kits, so every open node is still a valid part of what is left, and its bound
 * only rises). A solve pops the node of least bound and checks it against the rows born since it was last checked
 * and the rows its parent broke (see `NodeStore.pending`): a higher bound puts it back in line; a floor kit that
 * meets every row (and no "not exactly" cut) is the answer — every other open node's bound is at least its grams —
 * and the node stays open, for the next solve's cuts to split. Children are opened with their parent's bound (or
 * their floor's grams, if higher) and checked only when they come up: most never do.
 * @example createMasterSearch(pre).next({ cuts: [], energyCuts: [] }).status // 'optimal'
 */
export function createMasterSearch(pre: PresolvedProblem): MasterSearch {
  const n = pre.items.length;
  const massG = pre.items.map((it) => it.candidate.massG);
  const owned = pre.items.map((it) => it.candidate.ownedCount);
  const heap = new NodeHeap();
  const store = new NodeStore(n);
  /** The number of the current solve (a peek lets its copy's nodes go when it ends). */
  let serial = 0;
  /** The floor and ceiling of the node being worked on, of a child being opened, and of its later siblings. */
  const lb = new Uint8Array(n);
  const ub = new Uint8Array(n);
  const childLb = new Uint8Array(n);
  const childUb = new Uint8Array(n);
  const siblingsUb = new Uint8Array(n);
  let births = 0;
  const pathRows: BornRow[] = pre.needs.map((need) => ({ row: pathRow(need.alternatives, massG), birth: births++ }));
  /** Rows of cuts seen so far, by cut object: a cut passed again keeps its row and birth. */
  const cutRows = new WeakSet<object>();
  let started = false;

  /** The packed items of the node being checked (one buffer for the search). */
  const packed: Packed = { items: new Int32Array(n), length: 0 };
  /** Lists a floor's packed items in `packed`. */
  const packFloor = (lb: Uint8Array): void => {
    packed.length = 0;
    for (let i = 0; i < n; i++) if ((lb[i] as number) > 0) packed.items[packed.length++] = i;
  };

  const gramsOf = (lb: Uint8Array): number => {
    let g = 0;
    for (let i = 0; i < n; i++) g += (lb[i] ?? 0) * (massG[i] ?? 0);
    return g;
  };

  /**
   * Dominance: i packed ⇒ j at its full count. −1 when the node holds no kit; otherwise how many floors it raised (a
   * child whose floor it left alone has its grams and units from its parent's and its own raise).
   */
  const propagate = (lb: Uint8Array, ub: Uint8Array): number => {
    let raised = 0;
    for (let changed = true; changed;) {
      changed = false;
      for (const [i, j] of pre.dominance) {
        const full = owned[j] ?? 0;
        if ((lb[i] ?? 0) >= 1 && (lb[j] ?? 0) < full) {
          if ((ub[j] ?? 0) < full) return -1;
          lb[j] = full;
          raised++;
          changed = true;
        }
        if ((ub[j] ?? 0) < full && (ub[i] ?? 0) > 0) {
          if ((lb[i] ?? 0) > 0) return -1;
          ub[i] = 0;
          changed = true;
        }
      }
    }
    return raised;
  };

  /** Every row so far, in birth order: the path rows, then each cut's as it first comes. */
  const allRows: BornRow[] = [...pathRows];
  const rowOf = (cut: object, make: () => CoverRow): BornRow | undefined => {
    if (cutRows.has(cut)) return undefined;
    const born: BornRow = { row: make(), birth: births++ };
    cutRows.add(cut);
    allRows.push(born);
    return born;
  };
  /**
   * `metBits[i][c]`: the "no larger than" rows a floor meets by holding at least c of item i, by birth (the row of a
   * kit K is met by c units of i when c > K's count of i). A node catching up on hundreds of such rows ORs the bits of
   * its few packed items instead of asking each row: on a locker that needs hundreds of rounds, most rows a node
   * catches up on it meets.
   */
  const metBits = owned.map((k) => Array.from({ length: k + 1 }, () => new BirthBits()));
  /** The OR of the packed items' bits over the words of the births being checked (one buffer for the search). */
  let metMask = new Uint32Array(4);
  const noLargerRowOf = (cut: KitCut): void => {
    let limit: number[] = [];
    const born = rowOf(cut, () => noLargerRow((limit = countsOf(pre, cut)), massG, owned));
    if (!born) return;
    born.byBits = true;
    limit.forEach((k, i) => {
      for (let c = k + 1; c <= (owned[i] ?? 0); c++) metBits[i]?.[c]?.set(born.birth);
    });
  };

  /** One solve over `open` (the kept heap, or a copy whose nodes are copied before they change). */
  const solve = (instance: MasterCuts, limits: MasterLimits, open: NodeHeap, copyNodes: boolean): MasterAnswer => {
    let nodes = 0;
    if (pre.missingNeeds.length > 0) return { status: 'infeasible', nodes };
    // Counts are kept in bytes (a locker holds at most 20 of an item).
    if (owned.some((k) => k > 255)) return { status: 'gave-up', nodes };
    if (instance.energyCuts.some((cut) => !nonNegativeCut(cut))) return { status: 'gave-up', nodes };
    const nodeLimit = limits.nodeLimit ?? defaultMasterNodeLimit;
    const now = limits.now ?? (() => 0);
    const deadlineMs = limits.deadlineMs ?? Infinity;
    const capG = instance.maxMassG !== undefined ? instance.maxMassG + 0.5 : Infinity;
    // Rows are kept in birth order, the new cuts' appended; a row whose cut has since left the search (implied by a
    // larger one) stays: it still holds, and a kit search's cut list is hundreds long after a few hundred rounds.
    for (const cut of instance.energyCuts) rowOf(cut, () => energyRow(cut, pre, massG));
    for (const cut of instance.cuts) if (cut.kind === 'no-larger-than') noLargerRowOf(cut);
    const rows = allRows;
    const newest = rows.length > 0 ? (rows[rows.length - 1] as BornRow).birth : -1;
    const exactly = instance.cuts.filter((cut) => cut.kind === 'not-exactly').map((cut) => countsOf(pre, cut));
    const supersets = instance.cuts
      .filter((cut) => cut.kind === 'no-superset-of')
      .flatMap((cut) => {
        const present = [...cut.counts].filter(([, k]) => k > 0);
        const indexed = present.map(([id, k]) => [pre.itemIndexById.get(id), k] as const);
        // A kit holding an item the model cannot pack can never be exceeded: nothing to exclude.
        if (indexed.some(([i, k]) => i === undefined || k > (owned[i] ?? 0))) return [];
        return [indexed as (readonly [number, number])[]];
      });

    /**
     * Checks node `id` (its floor and ceiling read into `lb` and `ub`) against the rows born since it was last checked
     * and its pending rows. False when it holds no kit that meets them; otherwise its bound and broken row are brought
     * up to date.
     */
    const check = (id: number): boolean => {
      if (supersets.some((set) => set.every(([i, k]) => (lb[i] ?? 0) >= k))) return false;
      const seenBefore = store.seen[id] as number;
      // Checked itself against every row already: its bound and broken row are up to date.
      if (store.checked[id] === 1 && seenBefore === newest) return true;
      packFloor(lb);
      let needG = -1;
      let broken: CoverRow | null = null;
      const stillBroken: BornRow[] = [];
      const look = (born: BornRow): boolean => {
        const g = born.row.need(lb, ub, packed);
        if (g < 0) return true;
        if (g === Infinity) return false;
        stillBroken.push(born);
        if (g > needG) {
          needG = g;
          broken = born.row;
        }
        return true;
      };
      // The "no larger than" rows born since the node's last check that its floor meets, as bits from word `w0`.
      const w0 = (seenBefore + 1) >>> 5;
      const words = newest > seenBefore ? (newest >>> 5) - w0 + 1 : 0;
      if (words > 0) {
        if (metMask.length < words) metMask = new Uint32Array(2 * words);
        metMask.fill(0, 0, words);
        for (let j = 0; j < packed.length; j++) {
          const i = packed.items[j] as number;
          const bits = (metBits[i]?.[lb[i] as number] as BirthBits).words;
          const end = Math.min(words, bits.length - w0);
          for (let w = 0; w < end; w++) metMask[w] = (metMask[w] as number) | (bits[w0 + w] as number);
        }
      }
      for (let r = rows.length - 1; r >= 0; r--) {
        const born = rows[r] as BornRow;
        const birth = born.birth;
        if (birth <= seenBefore) break;
        if (born.byBits && ((metMask[(birth >>> 5) - w0] as number) & (1 << (birth & 31))) !== 0) continue;
        if (!look(born)) return false;
      }
      const pending = store.pending[id];
      if (pending) for (const born of pending) if (!look(born)) return false;
      store.surrogateDue[id] = broken !== null && brokenEnergyRows(stillBroken) >= 2 ? 1 : 0;
      store.seen[id] = newest;
      store.checked[id] = 1;
      store.pending[id] = stillBroken.length > 0 ? stillBroken : null;
      if (broken) {
        store.boundG[id] = Math.max(store.boundG[id] as number, (store.floorG[id] as number) + needG);
        store.broken[id] ??= broken;
      }
      return true;
    };

    /**
     * The surrogate bound of node `id`'s broken energy rows (grams over its floor): each row's shortfall is worked out
     * again for this node's floor first (a row keeps the shortfall of the last node it was asked about).
     */
    const surrogateOf = (id: number): number => {
      packFloor(lb);
      const rows = store.pending[id] ?? [];
      for (const born of rows) if (born.row.energy) born.row.need(lb, ub, packed);
      return surrogateNeedG(rows, lb, ub, massG);
    };

    /** Opens a child with floor `childLb` and ceiling `childUb` under `parent`, its bound at least its parent's. */
    const openChild = (
      parent: number,
      childLb: Uint8Array,
      childUb: Uint8Array,
      floorG: number,
      units: number,
    ): void => {
      const child = store.open(childLb, childUb, serial);
      store.floorG[child] = floorG;
      store.boundG[child] = Math.max(store.boundG[parent] as number, floorG);
      store.seen[child] = store.seen[parent] as number;
      store.pending[child] = store.pending[parent] ?? null;
      store.units[child] = units;
      open.push(child, store.boundG[child] as number, units);
    };

    /**
     * Opens the children of node `id` (floor and ceiling in `lb` and `ub`): one per way to meet the row it breaks when
     * every way raises a single item (see the module comment); otherwise two, on the item most of the ways raise —
     * packed to that count, or kept below it (ways that raise several items would overlap, and a path row may have
     * hundreds).
     */
    const split = (id: number, ways: readonly Raise[]): void => {
      // Each way's part the floor does not meet yet. Most ways raise one item: kept as they are, not copied (on the
      // 50-item bench plan the copies were the largest single allocation site, 5.8 of about 42 MB a plan).
      const unmet: Raise[] = [];
      let severalItems = false;
      for (const way of ways) {
        if (way.length === 1) {
          const [i, k] = way[0] as readonly [number, number];
          if ((lb[i] as number) < k) unmet.push(way);
          continue;
        }
        const part = way.filter(([i, k]) => (lb[i] as number) < k);
        if (part.length > 1) severalItems = true;
        if (part.length > 0) unmet.push(part);
      }
      const raises: readonly Raise[] = severalItems ? [[mostRaised(unmet, massG)]] : unmet;
      siblingsUb.set(ub);
      const floorG = store.floorG[id] as number;
      const units = store.units[id] as number;
      // Every way left raises a single item (see above): one child per item and count.
      const seen = new Set<number>();
      for (const raise of raises) {
        const first = raise[0];
        if (!first) continue;
        const key = first[0] * 256 + first[1];
        if (seen.has(key)) continue;
        seen.add(key);
        childLb.set(lb);
        childUb.set(siblingsUb);
        let possible = true;
        let addedG = 0;
        let addedUnits = 0;
        for (const [i, k] of raise) {
          if ((childUb[i] ?? 0) < k) possible = false;
          const more = k - (childLb[i] as number);
          if (more > 0) {
            childLb[i] = k;
            addedG += more * (massG[i] as number);
            addedUnits += more;
          }
        }
        const raisedByDominance = possible ? propagate(childLb, childUb) : -1;
        if (raisedByDominance >= 0) {
          // Summing the floor over every item for each of a node's children (dozens at 200 items) cost more than the rest.
          openChild(
            id,
            childLb,
            childUb,
            raisedByDominance === 0 ? floorG + addedG : gramsOf(childLb),
            raisedByDominance === 0 ? units + addedUnits : packedUnits(childLb),
          );
        }
        // The next siblings hold kits that do not take this way (kept apart when the way raises a single item).
        if (raise.length === 1) {
          const [i, k] = raise[0] as readonly [number, number];
          siblingsUb[i] = Math.min(siblingsUb[i] ?? 0, k - 1);
        }
      }
      if (raises !== unmet) {
        // The other half of the two-way split: the item kept below the count (the row is checked again there).
        childLb.set(lb);
        if (propagate(childLb, siblingsUb) >= 0) openChild(id, childLb, siblingsUb, floorG, units);
      }
    };

    /** The least stored bound of nodes `gone` (in the heap's order: the first). */
    const staleLeast = (gone: readonly number[]): number =>
      gone.length > 0 ? (store.boundG[gone[0] as number] as number) : Infinity;

    /**
     * The least bound of nodes `gone` (in the heap's order) under the rows of now: each node's stored bound is from its
     * last check, often many rounds old, so the least of them is brought up to date first, until the next stored bound
     * is no lower than the least found (the rest are no lower either), or after `reboundLimitWhenFull` nodes. A node
     * that holds no kit the rows allow counts for nothing.
     */
    const reboundLeast = (gone: readonly number[]): number => {
      let least = Infinity;
      for (let k = 0; k < gone.length; k++) {
        const id = gone[k] as number;
        const stored = store.boundG[id] as number;
        if (stored >= least) break;
        if (k >= reboundLimitWhenFull) return stored;
        store.read(id, lb, ub);
        if (!check(id)) continue;
        let boundG = store.boundG[id] as number;
        if (store.surrogateDue[id] === 1) boundG = Math.max(boundG, (store.floorG[id] as number) + surrogateOf(id));
        least = Math.min(least, boundG);
      }
      return least;
    };

    /** Puts node `id` back in line. */
    const putBack = (id: number): void => open.push(id, store.boundG[id] as number, store.units[id] as number);
    keepCompiled('master solve', check, surrogateOf, openChild, split, putBack);

    for (;;) {
      const popped = open.pop();
      // None left after nodes were let go: kits may remain there.
      if (popped === undefined)
        return open.shedBoundG < Infinity ? { status: 'too-large', nodes } : { status: 'infeasible', nodes };
      // A copy's nodes are shared with the kept heap, where a raised bound in place would break its order.
      const id = copyNodes ? store.copy(popped, serial) : popped;
      if ((store.boundG[id] as number) > capG + 1e-9) {
        // Every open node is above the cap: none is lost, a later solve without the cap may need them. (Nodes let go
        // may have held a kit under it: the cap serves the tie-break among kits of equal grams, which may miss one.)
        putBack(id);
        return { status: 'infeasible', nodes };
      }
      nodes++;
      if (nodes > nodeLimit || ((nodes & 255) === 0 && now() >= deadlineMs)) {
        putBack(id);
        return { status: 'gave-up', nodes };
      }
      if (open.size >= (limits.openLimit ?? maxOpenNodes)) {
        putBack(id);
        const gone = open.shed(Math.floor(open.size * keptShareWhenFull));
        open.shedBoundG = Math.min(open.shedBoundG, copyNodes ? staleLeast(gone) : reboundLeast(gone));
        // A copy's nodes opened before it are the kept heap's: only its own go.
        for (const g of gone) if (!copyNodes || store.openedIn[g] === serial) store.close(g);
        continue;
      }
      store.read(id, lb, ub);
      const before = store.boundG[id] as number;
      if (!check(id)) {
        store.close(id);
        continue;
      }
      if ((store.boundG[id] as number) > before + 1e-9) {
        // Re-bounded under newer rows: back in line.
        putBack(id);
        continue;
      }
      if (store.surrogateDue[id] === 1) {
        // The rows' surrogate, once the node is the least (most checks raise a node's bound by a single row and put it
        // back in line, and few come up again: on the 200-item bench locker 147,000 of 149,000 checks; working it out
        // at each check took 1.7 of the master's 5.2 s). The same bound as at the check: its rows have not changed.
        store.surrogateDue[id] = 0;
        const surrogateG = surrogateOf(id);
        if (surrogateG === Infinity) {
          store.close(id);
          continue;
        }
        const floorG = store.floorG[id] as number;
        if (floorG + surrogateG > (store.boundG[id] as number) + 1e-9) {
          store.boundG[id] = floorG + surrogateG;
          putBack(id);
          continue;
        }
      }
      const broken = store.broken[id];
      if (broken) {
        split(id, broken.raises(lb, ub));
        store.close(id);
        continue;
      }
      const same = exactly.find((k) => k.every((v, i) => v === (lb[i] ?? 0)));
      if (same) {
        split(
          id,
          same.flatMap((v, i) => ((ub[i] ?? 0) > v ? [[[i, v + 1] as const]] : [])),
        );
        store.close(id);
        continue;
      }
      putBack(id);
      const kitG = store.floorG[id] as number;
      return {
        status: 'optimal',
        counts: Array.from(lb),
        massG: kitG,
        lowerBoundG: Math.min(kitG, open.shedBoundG),
        nodes,
      };
    }
  };

  /** The root node (every count between 0 and the count owned), once. */
  const start = (): void => {
    if (started) return;
    started = true;
    const rootLb = new Uint8Array(n);
    const rootUb = Uint8Array.from(owned);
    if (propagate(rootLb, rootUb) >= 0) {
      const id = store.open(rootLb, rootUb, 0);
      store.floorG[id] = gramsOf(rootLb);
      store.boundG[id] = gramsOf(rootLb);
      store.seen[id] = -1;
      store.units[id] = packedUnits(rootLb);
      heap.push(id, store.boundG[id] as number, store.units[id] as number);
    }
  };

  /**
   * The search's closures are kept compiled between plans (`keepCompiled`) only while the nodes they reach are few: a
   * 200-item search holds tens of MB of nodes, and its seconds of search do not notice a recompile.
   */
  const keptUnlessLarge = (answer: MasterAnswer): MasterAnswer => {
    if (store.bytes > keptSearchBytes) releaseCompiled('master search', 'master solve');
    return answer;
  };

  const search: MasterSearch = {
    next(instance, limits = {}) {
      start();
      serial++;
      return keptUnlessLarge(solve(instance, limits, heap, false));
    },
    peek(instance, limits = {}) {
      start();
      serial++;
      const copy = heap.copy();
      const answer = solve(instance, limits, copy, true);
      // The copy's own nodes (those it opened or copied) go with it; the kept heap's stay.
      for (const id of copy.ids()) if (store.openedIn[id] === serial) store.close(id);
      return keptUnlessLarge(answer);
    },
  };
  keepCompiled('master search', search);
  return search;
}

/**
 * Solves one master instance from scratch (see `createMasterSearch`).
 * @example solveMasterByBranching({ pre, cuts: [], energyCuts: [] }).status // 'optimal'
 */
export function solveMasterByBranching(instance: MasterInstance, limits: MasterLimits = {}): MasterAnswer {
  return createMasterSearch(instance.pre).next(instance, limits);
}

/** Energy cuts found to have no negative coefficient (the bound needs none; checked once per cut). */
const nonNegativeCuts = new WeakSet<EnergyCut>();

function nonNegativeCut(cut: EnergyCut): boolean {
  if (nonNegativeCuts.has(cut)) return true;
  if (cut.itemWh.some((w) => w < 0) || cut.groupWh.some((w) => w < 0)) return false;
  nonNegativeCuts.add(cut);
  return true;
}

/** A binary min-heap of open node ids by bound; among equal bounds the node with more packed first (nearer a leaf). */
class NodeHeap {
  private nodes: number[] = [];
  /** Each node's bound and units beside it: comparisons read these packed numbers. */
  private bounds: number[] = [];
  private units: number[] = [];
  /** The least bound of the nodes it let go (`shed`); Infinity when none. */
  shedBoundG = Infinity;
  /** A heap over the same nodes (its own order from here on). */
  copy(): NodeHeap {
    const other = new NodeHeap();
    other.nodes = this.nodes.slice();
    other.bounds = this.bounds.slice();
    other.units = this.units.slice();
    other.shedBoundG = this.shedBoundG;
    return other;
  }
  /**
   * Keeps the first `keep` nodes in the heap's order and returns the others' ids in that order (for the caller to bound,
   * see `shedBoundG`, and close). A sorted array is a heap, so the kept ones stay in line.
   */
  shed(keep: number): number[] {
    const { nodes, bounds, units } = this;
    const order = Int32Array.from(nodes.keys()).sort((a, b) => {
      if (before(bounds[a] as number, units[a] as number, bounds[b] as number, units[b] as number)) return -1;
      return before(bounds[b] as number, units[b] as number, bounds[a] as number, units[a] as number) ? 1 : 0;
    });
    const at = (from: readonly number[], k: number): number => from[order[k] as number] as number;
    const gone: number[] = [];
    for (let k = keep; k < order.length; k++) gone.push(at(nodes, k));
    const kept = Array.from(order.subarray(0, keep));
    this.bounds = kept.map((k) => bounds[k] as number);
    this.units = kept.map((k) => units[k] as number);
    this.nodes = kept.map((k) => nodes[k] as number);
    return gone;
  }
  get size(): number {
    return this.nodes.length;
  }
  /** The ids it holds, in no order. */
  ids(): readonly number[] {
    return this.nodes;
  }
  private place(k: number, node: number, boundG: number, units: number): void {
    this.nodes[k] = node;
    this.bounds[k] = boundG;
    this.units[k] = units;
  }
  push(node: number, boundG: number, units: number): void {
    // Sift the hole up, moving parents down, and place the node once.
    let k = this.nodes.length;
    while (k > 0) {
      const parent = (k - 1) >> 1;
      if (!before(boundG, units, this.bounds[parent] as number, this.units[parent] as number)) break;
      this.place(k, this.nodes[parent] as number, this.bounds[parent] as number, this.units[parent] as number);
      k = parent;
    }
    this.place(k, node, boundG, units);
  }
  pop(): number | undefined {
    const { nodes, bounds, units } = this;
    const top = nodes[0];
    const last = nodes.pop();
    const lastBound = bounds.pop() as number;
    const lastUnits = units.pop() as number;
    const size = nodes.length;
    if (size > 0 && last !== undefined) {
      // Sift the hole down from the root, moving the better child up, and place the last node once.
      let k = 0;
      for (;;) {
        const l = 2 * k + 1;
        if (l >= size) break;
        const r = l + 1;
        const m =
          r < size && before(bounds[r] as number, units[r] as number, bounds[l] as number, units[l] as number) ? r : l;
        if (!before(bounds[m] as number, units[m] as number, lastBound, lastUnits)) break;
        this.place(k, nodes[m] as number, bounds[m] as number, units[m] as number);
        k = m;
      }
      this.place(k, last, lastBound, lastUnits);
    }
    return top;
  }
}

/** The heap's order: the lesser bound first; among equal bounds the node with more packed (nearer a leaf). */
function before(boundA: number, unitsA: number, boundB: number, unitsB: number): boolean {
  if (boundA !== boundB) return boundA < boundB;
  return unitsA > unitsB;
}

function packedUnits(lb: Uint8Array): number {
  let units = 0;
  for (let i = 0; i < lb.length; i++) units += lb[i] as number;
  return units;
}

/** The raise most ways share (ties: the heaviest), as a way of its own. */
function mostRaised(ways: readonly Raise[], massG: readonly number[]): readonly [number, number] {
  const tally = new Map<string, { raise: readonly [number, number]; ways: number }>();
  for (const way of ways)
    for (const raise of way) {
      const key = `${raise[0]}:${raise[1]}`;
      const entry = tally.get(key) ?? { raise, ways: 0 };
      entry.ways++;
      tally.set(key, entry);
    }
  let best: { raise: readonly [number, number]; ways: number } | undefined;
  for (const entry of tally.values())
    if (
      !best ||
      entry.ways > best.ways ||
      (entry.ways === best.ways && (massG[entry.raise[0]] ?? 0) > (massG[best.raise[0]] ?? 0))
    )
      best = entry;
  return (best as { raise: readonly [number, number] }).raise;
}

/** A cut's counts by item index, at most the counts owned. */
function countsOf(pre: PresolvedProblem, cut: KitCut): number[] {
  return pre.items.map((it) => Math.min(cut.counts.get(it.candidate.itemId) ?? 0, it.candidate.ownedCount));
}

/**
 * What a kit in [lb, ub] must raise to hold an alternative, as ways to branch on: the items it still lacks as one way,
 * or, when it lacks only one of the "any of" items, each of those alone. Every kit holding the alternative takes one of
 * them (a way need not complete the alternative: the row is checked again below it).
 */
function alternativeNeeds(alt: IndexedAlternative, lb: Uint8Array, ub: Uint8Array): Raise[] {
  const lacking: (readonly [number, number])[] = [];
  for (const [i, k] of alt.items) {
    if ((ub[i] ?? 0) < k) return [];
    if ((lb[i] ?? 0) < k) lacking.push([i, k]);
  }
  if (lacking.length > 0) return [lacking];
  if (alt.anyOf.length === 0 || alt.anyOf.some((i) => (lb[i] ?? 0) >= 1)) return [];
  return alt.anyOf.filter((i) => (ub[i] ?? 0) >= 1).map((i) => [[i, 1] as const]);
}

/**
 * Per alternative: whether one of its listed items is also one of its "any of" items (then holding the listed items
 * meets the "any of" part too). Fixed by the alternative, so read once: asked for every node, it took a third of the
 * master's time on the 200-item bench locker.
 */
const listedMeetsAnyOf = new WeakMap<IndexedAlternative, boolean>();

function anyOfMetByItems(alt: IndexedAlternative): boolean {
  let met = listedMeetsAnyOf.get(alt);
  if (met === undefined) {
    met = alt.anyOf.length === 0 || alt.items.some(([i, k]) => k >= 1 && alt.anyOf.includes(i));
    listedMeetsAnyOf.set(alt, met);
  }
  return met;
}

/** The least grams that raise lb to hold an alternative within ub (Infinity when ub forbids it). */
function alternativeGrams(alt: IndexedAlternative, lb: Uint8Array, ub: Uint8Array, massG: readonly number[]): number {
  let grams = 0;
  const items = alt.items;
  for (let j = 0; j < items.length; j++) {
    const [i, k] = items[j] as readonly [number, number];
    if ((ub[i] as number) < k) return Infinity;
    const lacking = k - (lb[i] as number);
    if (lacking > 0) grams += lacking * (massG[i] as number);
  }
  if (anyOfMetByItems(alt)) return grams;
  let cheapest = Infinity;
  for (const i of alt.anyOf) {
    if ((lb[i] as number) >= 1) return grams;
    if ((ub[i] as number) >= 1 && (massG[i] as number) < cheapest) cheapest = massG[i] as number;
  }
  return grams + cheapest;
}

/** Whether some kit within ub holds an alternative (`alternativeGrams` < Infinity, without the grams). */
function alternativePossible(alt: IndexedAlternative, ub: Uint8Array): boolean {
  const items = alt.items;
  for (let j = 0; j < items.length; j++) {
    const [i, k] = items[j] as readonly [number, number];
    if ((ub[i] as number) < k) return false;
  }
  if (anyOfMetByItems(alt)) return true;
  for (const i of alt.anyOf) if ((ub[i] as number) >= 1) return true;
  return false;
}

/** A device's need: one of its path alternatives present. */
function pathRow(alternatives: readonly IndexedAlternative[], massG: readonly number[]): CoverRow {
  return {
    need(lb, ub) {
      let least = Infinity;
      for (const alt of alternatives) {
        if (alternativePresent(alt, lb)) return -1;
        least = Math.min(least, alternativeGrams(alt, lb, ub, massG));
      }
      return least;
    },
    raises: (lb, ub) => alternatives.flatMap((alt) => alternativeNeeds(alt, lb, ub)),
  };
}

/** "No larger than K": some item above its count in K. */
function noLargerRow(limit: readonly number[], massG: readonly number[], owned: readonly number[]): CoverRow {
  // Only items below their count owned can go above the limit (a lifted kit holds most spares at their full count).
  const open = Int32Array.from(limit.flatMap((k, i) => (k < (owned[i] ?? 0) ? [i] : [])));
  /** By item: the count above the limit, 0 for an item that cannot go above it. */
  const aboveOf = new Uint8Array(limit.length);
  for (const i of open) aboveOf[i] = (limit[i] ?? 0) + 1;
  return {
    need(lb, ub, packed) {
      // Met when an item is above the limit; such an item holds a unit, so it is among the packed ones.
      for (let j = 0; j < packed.length; j++) {
        const i = packed.items[j] as number;
        const k = aboveOf[i] as number;
        if (k !== 0 && (lb[i] as number) >= k) return -1;
      }
      let least = Infinity;
      for (let j = 0; j < open.length; j++) {
        const i = open[j] as number;
        const k = aboveOf[i] as number;
        if ((ub[i] as number) >= k) least = Math.min(least, (k - (lb[i] as number)) * (massG[i] ?? 0));
      }
      return least;
    },
    raises(_lb, ub) {
      const ways: Raise[] = [];
      for (const i of open) {
        const k = aboveOf[i] as number;
        if ((ub[i] ?? 0) >= k) ways.push([[i, k]]);
      }
      return ways;
    },
  };
}

/**
 * An energy cut Σ_i min(w_i n_i, L) + Σ_g v_g·(alternatives of g present) ≥ L, as the master writes it (a group's
 * column per alternative, each at most its presence).
 */
function energyRow(cut: EnergyCut, pre: PresolvedProblem, massG: readonly number[]): CoverRow {
  const target = cut.lowerWh;
  const slack = energySlack * Math.max(1, Math.abs(target));
  const items: number[] = [];
  cut.itemWh.forEach((w, i) => {
    if (w > 0) items.push(i);
  });
  // Cheapest Wh first: the fractional knapsack takes them in this order.
  items.sort((a, b) => (massG[a] ?? 0) / (cut.itemWh[a] ?? 1) - (massG[b] ?? 0) / (cut.itemWh[b] ?? 1));
  const groups: number[] = [];
  cut.groupWh.forEach((w, g) => {
    if (w > 0) groups.push(g);
  });
  const allWh = cut.itemWh;
  /**
   * The Wh a floor holds towards the cut (its packed items), or any value ≥ `enoughWh` once it holds that much (every
   * term is ≥ 0).
   */
  const heldWh = (counts: Uint8Array, packed: Packed, enoughWh: number): number => {
    let wh = 0;
    for (let j = 0; j < packed.length; j++) {
      const i = packed.items[j] as number;
      const w = allWh[i] as number;
      if (!(w > 0)) continue;
      wh += Math.min(w * (counts[i] as number), target);
      if (wh >= enoughWh) return wh;
    }
    for (const g of groups)
      for (const alt of pre.groups[g]?.requiresAnyOf ?? [])
        if (alternativePresent(alt, counts)) wh += cut.groupWh[g] ?? 0;
    return wh;
  };
  const terms: EnergyTerms = { itemWh: cut.itemWh, targetWh: target, shortWh: 0 };
  let table: Float64Array | undefined;
  return {
    energy: terms,
    need(lb, ub, packed) {
      let shortWh = target - slack - heldWh(lb, packed, target - slack);
      if (shortWh <= 0) return -1;
      // Groups are counted at no cost wherever their alternative could still be present (an optimistic bound).
      for (const g of groups)
        for (const alt of pre.groups[g]?.requiresAnyOf ?? [])
          if (!alternativePresent(alt, lb) && alternativePossible(alt, ub)) shortWh -= cut.groupWh[g] ?? 0;
      terms.shortWh = shortWh;
      if (shortWh <= 0) return 0;
      let grams = 0;
      for (const i of items) {
        const w = cut.itemWh[i] ?? 0;
        const moreWh = Math.min(w * (ub[i] ?? 0), target) - Math.min(w * (lb[i] ?? 0), target);
        if (moreWh <= 0) continue;
        const usedWh = Math.min(moreWh, shortWh);
        grams += (usedWh * (massG[i] ?? 0)) / w;
        shortWh -= usedWh;
        if (shortWh <= 0) {
          table ??= wholeUnitTable(cut, pre, massG);
          return Math.max(grams, leastGramsFor(table, terms.shortWh));
        }
      }
      return Infinity;
    },
    raises(lb, ub) {
      const ways: Raise[] = [];
      for (const i of items)
        if ((ub[i] ?? 0) > (lb[i] ?? 0) && (cut.itemWh[i] ?? 0) * (lb[i] ?? 0) < target)
          ways.push([[i, (lb[i] ?? 0) + 1]]);
      for (const g of groups)
        for (const alt of pre.groups[g]?.requiresAnyOf ?? [])
          if (!alternativePresent(alt, lb)) ways.push(...alternativeNeeds(alt, lb, ub));
      return ways;
    },
  };
}

/**
 * The most Wh towards an energy cut that whole units of its items give for each weight in grams, from an empty kit, up
 * to the grams that meet the cut whole (a bounded knapsack by dynamic programming). A node's floor adds at most that
 * much for the same grams — each item's term min(w·n, L) gains less from a count already packed than from none — so the
 * least grams whose Wh reach what the floor is short bound what any kit in the node adds. Unlike the fractional bound
 * it knows items come whole.
 * Source: the bounded knapsack recursion (S. Martello and P. Toth, Knapsack Problems, Wiley 1990, ch. 3).
 */
function wholeUnitTable(cut: EnergyCut, pre: PresolvedProblem, massG: readonly number[]): Float64Array {
  const target = cut.lowerWh;
  const terms: { w: number; g: number; owned: number }[] = [];
  let freeWh = 0;
  cut.itemWh.forEach((w, i) => {
    if (!(w > 0)) return;
    const owned = pre.items[i]?.candidate.ownedCount ?? 0;
    const g = massG[i] ?? 0;
    if (g === 0) freeWh += Math.min(w * owned, target);
    else if (owned > 0) terms.push({ w, g, owned });
  });
  // Enough grams to meet the cut whole: units taken best Wh per gram first until they do.
  terms.sort((a, b) => a.g / Math.min(a.w, target) - b.g / Math.min(b.w, target));
  let spanG = 0;
  let wh = freeWh;
  for (const t of terms)
    for (let k = 1; k <= t.owned && wh < target; k++) {
      wh += Math.min(t.w * k, target) - Math.min(t.w * (k - 1), target);
      spanG += t.g;
    }
  const most = new Float64Array(spanG + 1).fill(freeWh);
  for (const t of terms)
    for (let g = spanG; g >= t.g; g--) {
      let best = most[g] as number;
      for (let k = 1; k <= t.owned && k * t.g <= g; k++) {
        const v = (most[g - k * t.g] as number) + Math.min(t.w * k, target);
        if (v > best) best = v;
      }
      most[g] = best;
    }
  return most;
}

/** The least grams whose Wh in `table` reach `shortWh` (the table's span when none does: it meets the whole cut). */
function leastGramsFor(table: Float64Array, shortWh: number): number {
  const needWh = shortWh * (1 - 1e-9);
  let lo = 0;
  let hi = table.length - 1;
  if ((table[hi] as number) < needWh) return hi;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if ((table[mid] as number) >= needWh) hi = mid;
    else lo = mid + 1;
  }
  return lo;
}

/** A copy of `a` twice as long. */
function grow(a: Float64Array): Float64Array {
  const b = new Float64Array(2 * a.length);
  b.set(a);
  return b;
}

/** How many of the rows are energy rows (the surrogate needs two). */
function brokenEnergyRows(rows: readonly BornRow[]): number {
  let count = 0;
  for (const born of rows) if (born.row.energy) count++;
  return count;
}

/** Scratch buffers for `surrogateNeedG`: per further unit, its share of the surrogate row, grams, grams per share. */
let unitGPerShare: Float64Array = new Float64Array(256);
let unitShare: Float64Array = new Float64Array(256);
let unitG: Float64Array = new Float64Array(256);
const unitOrder: number[] = [];

/**
 * A lower bound on the grams a node's floor must add to meet all its broken energy rows at once: the rows summed with
 * each divided by what it is short (a surrogate row; each item's part in a row capped at that shortfall, which keeps the
 * row as it was), then a fractional knapsack over the items' further units (each unit's part falls with the count, so
 * taking units by Wh per gram is the relaxation's optimum). −1 with fewer than two such rows.
 * Source: surrogate constraints (F. Glover, Surrogate constraints, Operations Research 16(4), 1968).
 */
function surrogateNeedG(broken: readonly BornRow[], lb: Uint8Array, ub: Uint8Array, massG: readonly number[]): number {
  const rows: EnergyTerms[] = [];
  for (const born of broken) if (born.row.energy && born.row.energy.shortWh > 0) rows.push(born.row.energy);
  if (rows.length < 2) return -1;
  const n = lb.length;
  let units = 0;
  for (let i = 0; i < n; i++) {
    const from = lb[i] as number;
    const to = ub[i] as number;
    if (to <= from) continue;
    const g = massG[i] as number;
    let before = 0;
    for (let c = from + 1; c <= to; c++) {
      let part = 0;
      for (const row of rows) {
        const w = row.itemWh[i] as number;
        if (!(w > 0)) continue;
        const gain = Math.min(w * c, row.targetWh) - Math.min(w * from, row.targetWh);
        part += Math.min(gain, row.shortWh) / row.shortWh;
      }
      const share = part - before;
      before = part;
      if (!(share > 0)) break;
      if (units === unitShare.length) {
        unitShare = grow(unitShare);
        unitG = grow(unitG);
        unitGPerShare = grow(unitGPerShare);
      }
      unitShare[units] = share;
      unitG[units] = g;
      unitGPerShare[units] = g / share;
      units++;
    }
  }
  unitOrder.length = units;
  for (let u = 0; u < units; u++) unitOrder[u] = u;
  unitOrder.sort((a, b) => (unitGPerShare[a] as number) - (unitGPerShare[b] as number));
  // Each row, divided by what it is short, asks for a share of 1.
  let shortShare = rows.length * (1 - 1e-9);
  let grams = 0;
  for (const u of unitOrder) {
    const share = unitShare[u] as number;
    if (share >= shortShare) return grams + (shortShare * (unitG[u] as number)) / share;
    grams += unitG[u] as number;
    shortShare -= share;
  }
  return Infinity;
}

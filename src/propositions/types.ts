/**
 * Propositions: what the clauses of one sentence assert, in typed form. Offsets (`start`, `end`)
 * are UTF-16 indices into the sentence. Polarity is how the sentence holds the proposition:
 * asserted, denied (negated, ruled out, or a rhetorical question's answer) or open (asked, or
 * under a denied inference such as "this does not mean that...").
 */
export type Polarity = 'asserted' | 'denied' | 'open';

/** A says that B happens because of A ("CO2 amplified the warming"; "CO2 is not the cause"). */
export interface Cause {
  kind: 'cause';
  /** The thing said to act: `co2`, `temperature`, `orbit`..., undefined when it cannot be told. */
  agent?: string;
  /** What it acts on; undefined when not named. */
  patient?: string;
  /** `start`: only the trigger; `amplify`: a feedback role; `feedback`: a loop running both ways. */
  role: 'cause' | 'start' | 'amplify' | 'feedback';
  polarity: Polarity;
  /** Marked as the only cause ("alone", "solely", "nothing but"). */
  exclusive: boolean;
  start: number;
  end: number;
}

/** `first` changed before `then` (or with it, when `together`). */
export interface Order {
  kind: 'order';
  first: string;
  then: string;
  together: boolean;
  /** Region of the temperature in the order, when named (`global`, `antarctic`...). */
  region?: string;
  /** The sentence names an ice core or an Antarctic record as the evidence. */
  recordNamed: boolean;
  /** The order carries a size ("by 800 years", "centuries"). */
  amount: boolean;
  /** Read from a bare "the lag", which by convention means CO2 after temperature. */
  implicit: boolean;
  /** The later thing "merely" or "simply" followed: it is cast as a mere follower. */
  dismissive: boolean;
  start: number;
  end: number;
}

/** A thing moving one way: water warming, uptake of CO2 falling, Antarctica cooling. */
export interface Directed {
  /** Entity or region key. */
  of: string;
  attribute: 'temperature' | 'uptake' | 'amount';
  /** The direction as the words state it, before any denial. */
  dir: 1 | -1;
  /** A denial stands before it in its clause ("does not hold more"). */
  negated: boolean;
  /** A state ("warmer water") or a change ("the ocean warms"). */
  form: 'state' | 'change';
  first: number;
  last: number;
  start: number;
  end: number;
}

/** Two directed things said to go together ("warmer water holds less CO2"). */
export interface Relation {
  kind: 'relation';
  x: Directed;
  y: Directed;
  start: number;
  end: number;
}

/** `a` stands higher (1), lower (-1) or level (0) with `b` in age or size. */
export interface Comparison {
  kind: 'comparison';
  a: string;
  b: string;
  attribute: 'age' | 'size' | 'rate';
  sign: 1 | -1 | 0;
  start: number;
  end: number;
}

/** A thing that moved one way, in a named period when there is one. */
export interface Change {
  kind: 'change';
  of: string;
  attribute: 'temperature' | 'amount';
  dir: 1 | -1;
  during?: string;
  start: number;
  end: number;
}

/** Co-variation offered as proof of a cause ("the curves match, which proves CO2 drives it"). */
export interface Evidence {
  kind: 'evidence';
  start: number;
  end: number;
}

/** Everything one sentence asserts. */
export interface Propositions {
  causes: Cause[];
  orders: Order[];
  relations: Relation[];
  comparisons: Comparison[];
  changes: Change[];
  evidence: Evidence[];
}

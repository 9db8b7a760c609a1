/**
 * Direction facts read against propositions: a pack states each fact as data (a signed relation,
 * a comparison, an order, a change in a period) and the sentence's propositions are compared with
 * it. A proposition that goes the other way is flagged, whatever words state it.
 *
 *   fact  relation {x: water:temperature, y: co2:uptake, sign: opposite}
 *   "Seawater that warms up takes in more CO2."  relation (+1, +1): same → flagged
 */
import type { Propositions } from '../../propositions/index.js';
import type { DirectionFact, FactForm } from '../../rulepack/types.js';
import type { FlagDraft } from '../../types.js';

/** Flags for every fact a sentence's propositions contradict (offsets into the sentence). */
export function checkFacts(props: Propositions, facts: readonly DirectionFact[]): FlagDraft[] {
  const flags: FlagDraft[] = [];
  for (const fact of facts) {
    const hit = fact.says.map((form) => contradiction(props, form)).find((span) => span !== undefined);
    if (hit !== undefined) flags.push(directionFlag(fact, hit));
  }
  return flags;
}

/** The flag of a direction fact stated the wrong way round at `span`, however it was found. */
export function directionFlag(fact: DirectionFact, span: { start: number; end: number }): FlagDraft {
  return {
    ruleId: fact.id.startsWith('direction.') ? fact.id : `direction.${fact.id}`,
    level: fact.level,
    start: span.start,
    end: span.end,
    reason: `This states the effect the wrong way round. ${fact.statement}`,
    suggestion: `Reword so that the direction matches the sources: ${fact.statement}`,
    sources: fact.sources,
  };
}

type Span = { start: number; end: number };

/** The span of the first proposition that contradicts `form`. */
function contradiction(props: Propositions, form: FactForm): Span | undefined {
  switch (form.kind) {
    case 'relation':
      return props.relations.find(
        (r) => r.x.of === form.x.key && r.x.attribute === form.x.attribute && r.y.of === form.y.key && r.y.attribute === form.y.attribute && r.x.dir * r.y.dir !== form.sign,
      );
    case 'comparison':
      return props.comparisons.find((c) => {
        if (c.attribute !== form.attribute) return false;
        if (form.a.includes(c.a) && form.b.includes(c.b)) return c.sign !== form.sign;
        if (form.a.includes(c.b) && form.b.includes(c.a)) return -c.sign !== form.sign;
        return false;
      });
    case 'order':
      return props.orders.find(
        (o) => !o.together && o.first === form.then && o.then === form.first && (form.regions.length === 0 || (o.region !== undefined && form.regions.includes(o.region))) && !isFeedbackAccount(props, o.then),
      );
    case 'change':
      return props.changes.find(
        (c) => form.of.includes(c.of) && c.attribute === form.attribute && c.dir !== form.sign && (form.during.length === 0 || (c.during !== undefined && form.during.includes(c.during))),
      );
  }
}

/**
 * "Once the orbit had started the thaw, CO2 amplified it": the later thing acts on what came first,
 * as an amplifier or after another agent's start. The sentence tells a feedback, not the order in
 * which the two curves moved.
 */
function isFeedbackAccount(props: Propositions, later: string): boolean {
  const acts = props.causes.filter((c) => c.agent === later && c.polarity === 'asserted');
  return acts.some((c) => c.role === 'amplify') || (acts.length > 0 && props.causes.some((c) => c.role === 'start' && c.agent !== undefined && c.agent !== later && c.polarity === 'asserted'));
}

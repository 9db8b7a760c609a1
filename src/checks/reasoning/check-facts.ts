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
    if (hit === undefined) continue;
    flags.push({
      ruleId: fact.id.startsWith('direction.') ? fact.id : `direction.${fact.id}`,
      level: fact.level,
      start: hit.start,
      end: hit.end,
      reason: `This states the effect the wrong way round. ${fact.statement}`,
      suggestion: `Reword so that the direction matches the sources: ${fact.statement}`,
      sources: fact.sources,
    });
  }
  return flags;
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
        (o) => !o.together && o.first === form.then && o.then === form.first && (form.regions.length === 0 || (o.region !== undefined && form.regions.includes(o.region))),
      );
    case 'change':
      return props.changes.find(
        (c) => form.of.includes(c.of) && c.attribute === form.attribute && c.dir !== form.sign && (form.during.length === 0 || (c.during !== undefined && form.during.includes(c.during))),
      );
  }
}

import type { MixResponse } from '@homeground/shared';
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import { balanceQueryOptions, mixKeys } from '../../../api/mixes/mixes.queries.js';
import { balanceRequestFor, type MixPlan } from '../utils/mix-plan.js';

export type PlanChange = (plan: MixPlan, options?: { replace?: boolean }) => void;

const toggle = (list: readonly string[], slug: string) =>
  list.includes(slug) ? list.filter((s) => s !== slug) : [...list, slug];

/**
 * The mix for a plan, and the person's changes to it. Locks and exclusions are marks that wait
 * for Rebalance; a swap changes the species at once. The first answer's species are written into
 * the plan, so reloading or sharing the page shows this same mix.
 */
export function useMixPlan(plan: MixPlan, onPlanChange: PlanChange) {
  const queryClient = useQueryClient();
  const request = balanceRequestFor(plan);
  const query = useQuery(balanceQueryOptions(request));
  const current = query.isPlaceholderData ? undefined : query.data;

  useEffect(() => {
    if (!current || plan.chosen) return;
    const chosen = current.palette.chosen.map((c) => c.slug);
    if (chosen.length === 0) return;
    const next: MixPlan = { ...plan, chosen };
    // The same species come back when all are kept, so this answer stands for that request too.
    queryClient.setQueryData<MixResponse>(mixKeys.balance(balanceRequestFor(next)), current);
    onPlanChange(next, { replace: true });
  }, [current, plan, onPlanChange, queryClient]);

  const slugs = query.data?.palette.chosen.map((c) => c.slug) ?? plan.chosen ?? [];
  // Changes made before the URL has caught up with the first answer must still carry its species.
  const known: MixPlan = !plan.chosen && current ? { ...plan, chosen: slugs } : plan;

  return {
    query,
    slugs,
    isUpdating: query.isFetching && query.isPlaceholderData,
    toggleLock: (slug: string) =>
      onPlanChange(
        { ...known, locked: toggle(known.locked, slug), excluded: known.excluded.filter((s) => s !== slug) },
        { replace: true },
      ),
    toggleExclude: (slug: string) =>
      onPlanChange(
        { ...known, excluded: toggle(known.excluded, slug), locked: known.locked.filter((s) => s !== slug) },
        { replace: true },
      ),
    /** Runs the balance again with the person's locks and exclusions, keeping the mix's size. */
    rebalance: () => {
      const next: MixPlan = { ...known, size: known.size ?? query.data?.palette.size };
      delete next.chosen;
      onPlanChange(next);
    },
    /**
     * A swap is a choice that must survive a rebalance: the replacement is kept (locked) and the
     * species it replaced is left out (excluded).
     */
    swap: (slot: string, replacement: string) =>
      onPlanChange({
        ...plan,
        chosen: slugs.map((s) => (s === slot ? replacement : s)),
        locked: [...known.locked.filter((s) => s !== slot && s !== replacement), replacement],
        excluded: [...known.excluded.filter((s) => s !== replacement && s !== slot), slot],
      }),
    /** Adds a species found by search: it joins the mix now and is kept through rebalancing. */
    addSpecies: (slug: string) => {
      if (slugs.includes(slug)) return;
      onPlanChange({
        ...known,
        chosen: [...slugs, slug],
        locked: [...known.locked.filter((s) => s !== slug), slug],
        excluded: known.excluded.filter((s) => s !== slug),
      });
    },
    /** A new species count: the mix is balanced again at that size, keeping the person's choices. */
    setSize: (size: number) => {
      const next: MixPlan = { ...known, size };
      delete next.chosen;
      onPlanChange(next);
    },
  };
}

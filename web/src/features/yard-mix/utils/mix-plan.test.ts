import { describe, expect, it } from 'vitest';
import { paths } from '../../../config/paths.js';
import { balanceRequestFor, type MixPlan } from './mix-plan.js';

const planToSearchParams = (plan: MixPlan) => paths.findPlants.search({ plan });
const planFromSearchParams = (params: URLSearchParams) => paths.findPlants.parse(params).plan;

// A Larkfield, Wisconsin yard (DESIGN.md demo scenario) in the Driftless Area, EPA Level III 52.
const plan: MixPlan = {
  region: { state: 'WI', ecoregionCode: '52' },
  site: {
    sun: 'shade',
    moisture: 'wet',
    areaSqM: 18.5,
    maxHeightCm: 120,
    deerPressure: 'high',
    goals: ['rain-garden', 'birds'],
    woodyPlants: true,
    spreaders: true,
  },
  areaUnit: 'm2',
  size: 7,
  locked: ['carex-crinita'],
  excluded: ['impatiens-capensis'],
  chosen: ['carex-crinita', 'packera-aurea', 'mertensia-virginica'],
};

describe('mix plan in the URL', () => {
  it('comes back the same after a trip through the query string', () => {
    const qs = planToSearchParams(plan).toString();
    expect(qs).toBe(
      'state=WI&eco=52&sun=shade&moisture=wet&area=18.5&unit=m2&maxh=120&deer=high&goals=rain-garden%2Cbirds&woody=1&spreaders=1&size=7' +
        '&locked=carex-crinita&excluded=impatiens-capensis&chosen=carex-crinita%2Cpackera-aurea%2Cmertensia-virginica',
    );
    expect(planFromSearchParams(new URLSearchParams(qs))).toEqual({ kind: 'plan', plan });
  });

  it('says what is wrong with a hand-edited link', () => {
    const result = planFromSearchParams(new URLSearchParams('state=ZZ&sun=full&moisture=dry&area=-5&deer=low'));
    expect(result.kind).toBe('invalid');
    expect(result.kind === 'invalid' && result.problems.join(' ')).toMatch(/state/);
    expect(result.kind === 'invalid' && result.problems.join(' ')).toMatch(/areaSqFt/);
  });

  it('asks the API to keep exactly the known species, so a shared link shows the same mix', () => {
    expect(balanceRequestFor(plan).options).toEqual({ size: 3, locked: plan.chosen, excluded: [] });
    const fresh = { ...plan, chosen: undefined };
    expect(balanceRequestFor(fresh).options).toEqual({
      size: 7,
      locked: ['carex-crinita'],
      excluded: ['impatiens-capensis'],
    });
  });
});

import { describe, expect, it } from 'vitest';
import { type MixPlan, paths, stepOf, withGround, withStep } from './paths.js';

const query = (url: string) => new URL(url, 'http://localhost').searchParams;

// Demo scenario (DESIGN.md): Larkfield, Wisconsin, EPA Level III ecoregion 52 (Driftless Area).
const plan: MixPlan = {
  region: { state: 'WI', ecoregionCode: '52' },
  site: {
    sun: 'part',
    moisture: 'dry',
    soilTexture: 'sand',
    areaSqFt: 200,
    deerPressure: 'high',
    goals: ['monarchs', 'birds'],
  },
  areaUnit: 'ft2',
  size: 9,
  locked: ['asclepias-tuberosa'],
  excluded: ['rudbeckia-hirta'],
  chosen: ['asclepias-tuberosa', 'solidago-speciosa'],
};

describe('page URLs are built and read in one place', () => {
  it('round-trips the species browser filters, leaving defaults out', () => {
    const url = paths.species.build({ q: 'milkweed', state: 'WI', sun: 'full', monarchHost: true, page: 2 });
    expect(url).toBe('/species?q=milkweed&state=WI&sun=full&monarchHost=true&page=2');
    expect(paths.species.parse(query(url))).toMatchObject({
      q: 'milkweed',
      state: 'WI',
      sun: 'full',
      monarchHost: true,
      page: 2,
      pageSize: 50,
    });
    expect(paths.species.build()).toBe('/species');
  });

  it('drops a hand-edited value the API would refuse and keeps the rest', () => {
    const s = paths.species.parse(query('/species?sun=bright&bloomMonth=13&state=WI'));
    expect(s.sun).toBeUndefined();
    expect(s.bloomMonth).toBeUndefined();
    expect(s.state).toBe('WI');
  });

  it('round-trips a cards selection, well-formed slugs only, first mention kept', () => {
    const url = paths.cardsLabels.build({ species: ['asclepias-tuberosa', 'zizia-aurea'] });
    expect(url).toBe('/cards-and-labels?species=asclepias-tuberosa%2Czizia-aurea');
    expect(paths.cardsLabels.parse(query(url))).toEqual({ species: ['asclepias-tuberosa', 'zizia-aurea'] });
    expect(
      paths.cardsLabels.parse(query('/cards-and-labels?species=Zizia-Aurea,,bad slug!,zizia-aurea&mix=m1')),
    ).toEqual({ species: ['zizia-aurea'], mix: 'm1' });
    expect(paths.cardsLabels.build()).toBe('/cards-and-labels');
  });

  it('round-trips a whole yard mix plan: the share link reopens the same mix', () => {
    const search = paths.findPlants.parse(query(paths.findPlants.build({ plan })));
    expect(search.plan).toEqual({ kind: 'plan', plan });
    expect(search.region).toEqual({ state: 'WI', ecoregionCode: '52' });
    expect(stepOf(search)).toBe('mix');
  });

  it('says in words what is wrong with a link whose yard answers are incomplete', () => {
    const search = paths.findPlants.parse(query('/find-plants?state=WI&sun=full'));
    expect(search.plan.kind).toBe('invalid');
    expect(stepOf(search)).toBe('mix');
  });

  it('walks the steps: ground until there is one, then yard, then the mix', () => {
    expect(stepOf(paths.findPlants.parse(query(paths.findPlants.build())))).toBe('ground');
    const ground = paths.findPlants.build({ region: { state: 'WI', ecoregionCode: '52' }, step: 'yard' });
    expect(ground).toBe('/find-plants?state=WI&eco=52&step=yard');
    expect(stepOf(paths.findPlants.parse(query(ground)))).toBe('yard');
    const full = paths.findPlants.search({ plan });
    expect(stepOf(paths.findPlants.parse(withStep(full, 'ground')))).toBe('ground');
    expect(withStep(withStep(full, 'yard'), 'mix').toString()).toBe(full.toString());
  });

  it('a new ground keeps the yard answers but forgets the finished mix', () => {
    const next = withGround(paths.findPlants.search({ plan }), { state: 'MN' });
    expect(next.get('state')).toBe('MN');
    expect(next.has('eco')).toBe(false);
    expect(next.get('sun')).toBe('part');
    expect(['chosen', 'locked', 'excluded', 'size'].filter((k) => next.has(k))).toEqual([]);
    expect(next.get('step')).toBe('yard');
  });

  it('keeps only same-site paths as the place to go after signing in', () => {
    expect(paths.signIn.build('/account')).toBe('/sign-in?next=%2Faccount');
    expect(paths.signIn.parse(query(paths.signIn.build('/account')))).toEqual({ next: '/account' });
    expect(paths.signIn.parse(query('/sign-in?next=%2F%2Fevil.example'))).toEqual({});
    expect(paths.register.parse(query('/register?next=https%3A%2F%2Fevil.example'))).toEqual({});
  });
});

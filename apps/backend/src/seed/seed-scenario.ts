import type { EntityManager } from '@mikro-orm/core';
import type { INestApplicationContext } from '@nestjs/common';
import { initialInspectionState } from '@gaugeproof/standards';
import { Lot } from '../lots/entities/lot.entity';
import { parseConductors, replaceConductors } from '../products/conductor-specs';
import { InspectionState } from '../products/entities/inspection-state.entity';
import { Product } from '../products/entities/product.entity';
import { clock } from '../common/clock';
import type { DemoCatalog } from './seed-catalog';
import { scenarioContext } from './seed-scenario-context';
import { InstrumentBench } from './seed-scenario-instruments';
import { runLot } from './seed-scenario-lots';
import { seedReturns } from './seed-scenario-returns';
import { seedScars } from './seed-scenario-scars';
import { STORY } from './seed-scenario-story';

/** Quickamp's "copper" spool: the product the copper-clad aluminium came under (invented). */
function addScenarioProducts(em: EntityManager, catalog: DemoCatalog): void {
  const product = em.create(Product, {
    supplier: catalog.suppliers.quickamp,
    sku: 'QA-4-CU100',
    kind: 'spool',
    description: '4 AWG "OFC copper" power cable, red, 100 m spool',
    lengthPerUnitM: 100,
  });
  replaceConductors(
    em,
    product,
    parseConductors([
      { purpose: 'power', gauge: '4 AWG', claimedMaterial: 'copper', claimedStrands: 380 },
    ]),
  );
  em.create(InspectionState, {
    product,
    severity: 'normal',
    state: { ...initialInspectionState() },
  });
  catalog.products.qaSpool4 = product;
}

/**
 * The invented history on top of the catalog (seed-scenario-story.ts tells it): about
 * eight months of lots received, cut, measured, photographed and decided through the real
 * services at the story's dates, then the returns and SCARs that followed, so that every
 * screen has something to show on first start. Deterministic: a seeded generator invents
 * the raw readings; the standards library computes every result from them.
 */
export async function seedScenario(
  app: INestApplicationContext,
  em: EntityManager,
  catalog: DemoCatalog,
): Promise<void> {
  const now = clock.now();
  addScenarioProducts(em, catalog);
  await em.flush();
  const bench = await InstrumentBench.open(em, now);
  const ctx = await scenarioContext(app, em, catalog, now);
  const lots = new Map<string, number>();
  for (const [index, story] of STORY.entries()) {
    lots.set(story.key, (await runLot(ctx, bench, story, index)).id);
    // Each lot is its own piece of work: a small identity map keeps every flush cheap.
    em.clear();
  }
  const loaded = await em.find(
    Lot,
    { id: { $in: [...lots.values()] } },
    { populate: ['supplier'] },
  );
  const lot = (key: string) => loaded.find((l) => l.id === lots.get(key)) as Lot;
  await seedReturns(ctx, lot);
  await seedScars(ctx, lot);
}

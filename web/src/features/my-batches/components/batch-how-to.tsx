import { Accordion, AccordionHeader, AccordionItem, AccordionPanel } from '@fluentui/react-components';
import {
  FRIDGE_STRATIFYING_HOW_TO,
  HARDEN_OFF_HOW_TO,
  METHOD_HOW_TO,
  SCARIFYING_HOW_TO,
  type Batch,
} from '@homeground/shared';
import { useMyBatchesStyles } from './my-batches.styles.js';

/** The how-tos this batch needs: its treatment, its method, and hardening off for indoor seedlings. */
export function howTosFor(batch: Pick<Batch, 'method' | 'treatments'>) {
  const list: { title: string; steps: readonly string[] }[] = [];
  if (batch.treatments.some((t) => t.where === 'refrigerator')) list.push(FRIDGE_STRATIFYING_HOW_TO);
  if (batch.treatments.some((t) => t.kind === 'scarification')) list.push(SCARIFYING_HOW_TO);
  list.push(METHOD_HOW_TO[batch.method]);
  if (batch.method === 'indoor-lights' || batch.method === 'soil-blocks') list.push(HARDEN_OFF_HOW_TO);
  return list;
}

/** Short how-tos for a first-time grower, folded so the phone screen stays short. */
export function BatchHowTo({ batch }: { batch: Batch }) {
  const styles = useMyBatchesStyles();
  return (
    <Accordion collapsible multiple>
      {howTosFor(batch).map((h) => (
        <AccordionItem key={h.title} value={h.title}>
          <AccordionHeader size="large">{h.title}</AccordionHeader>
          <AccordionPanel>
            <ol className={styles.list}>
              {h.steps.map((s) => (
                <li key={s}>{s}</li>
              ))}
            </ol>
          </AccordionPanel>
        </AccordionItem>
      ))}
    </Accordion>
  );
}

// Invented claim contacts for the demo jobs: coined firms and people, .test addresses and
// 555-01xx numbers (a range kept for fiction). Chosen by the job's position, so re-runs agree.
import type { ClaimContacts } from '../../shared/contacts';

const CLIENTS = [
  { name: 'Tolvenmark Mutual (invented carrier)', domain: 'tolvenmark.test', adjusters: ['Ines Farrowby', 'Calder Moyne'] },
  { name: 'Quillan Claims Administration (invented)', domain: 'quillan-claims.test', adjusters: ['Petra Olweny', 'Soren Haddleby'] },
  { name: 'Ferrowick Adjusting (invented)', domain: 'ferrowick.test', adjusters: ['Marisol Cheung-Barra'] },
];
const POLICYHOLDERS = [
  'Adaeze Thornquist',
  'Bram Velloway',
  'Corinne Ashdale',
  'Dmitri Pellworth',
  'Esme Rowantree',
  'Faisal Odenkirk',
  'Greta Lumholt',
];
const ACCESS = [
  'Lockbox on the side gate; code from the office.',
  'Occupants home after 3 pm. Two dogs, kept in the yard.',
  'Key with the neighbour at number 14.',
  'Basement door sticks; standing water reported in the utility room.',
  'Vacant since the loss; power off at the main breaker.',
];

export function demoContacts(index: number): ClaimContacts {
  const client = CLIENTS[index % CLIENTS.length];
  const adjuster = client.adjusters[index % client.adjusters.length];
  return {
    clientName: client.name,
    adjusterName: adjuster,
    adjusterEmail: `${adjuster.toLowerCase().replace(/[^a-z]+/g, '.')}@${client.domain}`,
    policyholderName: POLICYHOLDERS[index % POLICYHOLDERS.length],
    policyholderPhone: `+1 555 01${String(10 + (index % 90)).padStart(2, '0')} ${String(1000 + ((index * 37) % 9000))}`,
    accessNotes: ACCESS[index % ACCESS.length],
  };
}

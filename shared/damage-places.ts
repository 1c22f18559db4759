// Where a damage area sits: a room, or a place outside the rooms (the exterior walls, the
// roof, a detached structure). Stored in the damage area's `roomKey`; the places that are
// not rooms use keys a room can never have.

export const EXTERIOR_PLACE = '@exterior';
export const ROOF_PLACE = '@roof';

export type DamagePlace = { key: string; label: string; kind: 'room' | 'exterior' | 'roof' | 'structure' };

type Named = { key: string; name: string };

export function damagePlaces(record: { rooms: Named[]; detachedStructures: Named[] }): DamagePlace[] {
  return [
    ...record.rooms.map((r, i) => ({ key: r.key, label: r.name.trim() || `Room ${i + 1}`, kind: 'room' as const })),
    { key: EXTERIOR_PLACE, label: 'Exterior walls', kind: 'exterior' },
    { key: ROOF_PLACE, label: 'Roof', kind: 'roof' },
    ...record.detachedStructures.map((s, i) => ({
      key: s.key,
      label: s.name.trim() || `Detached structure ${i + 1}`,
      kind: 'structure' as const,
    })),
  ];
}

export function damagePlaceName(record: { rooms: Named[]; detachedStructures: Named[] }, key: string): string {
  return damagePlaces(record).find((p) => p.key === key)?.label ?? 'Place not named';
}

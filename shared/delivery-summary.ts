// The acceptance summary for the adjuster, as plain-language content: the PDF and the shared
// page both render this, so they can never say different things.
import {
  type CaptureRecord,
  GAP_CAUSE_LABELS,
  HAZARD_LABELS,
  LEVEL_LABELS,
  type LevelKind,
  REFLECTIVE_LABELS,
  roomAreaM2,
  SPLIT_REASON_LABELS,
  STRUCTURE_LABELS,
} from './capture-record';
import type { ClaimContacts } from './contacts';
import { damagePlaceName } from './damage-places';
import { type JobFields, LOSS_TYPE_LABELS, PROPERTY_TYPE_LABELS } from './jobs';
import type { StationPoint } from './station-file';
import { metresToFeet, squareMetresToSquareFeet } from './units';

export type SummaryInput = {
  job: Pick<JobFields, 'claimReference' | 'street' | 'city' | 'postcode' | 'propertyType' | 'lossType' | 'lossDate' | 'siteVisitDate'>;
  contacts: Pick<ClaimContacts, 'clientName' | 'adjusterName'>;
  technicianName: string;
  record: CaptureRecord;
  revision: number;
  // Station positions per level, from the stored analysis of the accepted revision.
  plans: {
    level: LevelKind;
    stations: Pick<StationPoint, 'number' | 'x' | 'y' | 'kind'>[];
    links: { from: number; to: number; weak: boolean }[];
  }[];
  review: { score: number | null; passMark: number; reviewerName: string; decidedAt: string };
  photos: SummaryPhotoRef[];
};

// A photo as the summary names it: its file name and the technician's caption, if any.
export type SummaryPhotoRef = { id: number; name: string; caption?: string | null };

// How the summary labels a photo: the caption first, since it says what the photo shows.
export function photoLabel(photo: SummaryPhotoRef): string {
  return photo.caption?.trim() ? `${photo.caption.trim()} (${photo.name})` : photo.name;
}

export type DeliverySummary = {
  claimReference: string;
  client: string;
  adjuster: string | null;
  property: string;
  propertyType: string;
  loss: string;
  siteVisit: string;
  technician: string;
  models: { structure: string; reference: string; split: string | null }[];
  levels: { level: string; stations: number; rooms: { name: string; size: string; stations: number; doorway: boolean }[] }[];
  plans: SummaryInput['plans'];
  damage: { room: string; description: string; stations: string; photos: SummaryPhotoRef[] }[];
  gaps: { location: string; cause: string; resolved: boolean; note: string }[];
  reflective: { room: string; kind: string; found: number; flagged: number }[];
  hazards: string[];
  qc: { score: string; passMark: string; reviewer: string; decidedOn: string; revisions: number };
  notShown: string[];
  footer: string;
};

export const SUMMARY_FOOTER =
  "Measurements come from the capture platform's 3D model, as recorded by the technician. This summary is a record of what was captured and checked; it is not a survey.";

const m2 = (v: number) => `${v.toFixed(1)} m²`;
const ft2 = (v: number) => `${Math.round(v)} ft²`;
const len = (metres: number) => `${metres.toFixed(2)} m (${metresToFeet(metres).toFixed(1)} ft)`;

// A room's size in the record's own unit first, the other beside it.
export function roomSize(room: CaptureRecord['rooms'][number], unit: CaptureRecord['units']): string {
  const area = roomAreaM2(room);
  const dims = room.lengthM && room.widthM ? `${len(room.lengthM)} × ${len(room.widthM)}` : null;
  if (area === null) return dims ?? 'Size not recorded';
  const areaText =
    unit === 'ft' ? `${ft2(squareMetresToSquareFeet(area))} (${m2(area)})` : `${m2(area)} (${ft2(squareMetresToSquareFeet(area))})`;
  return dims ? `${dims}, ${areaText}` : areaText;
}

export function deliverySummary(input: SummaryInput): DeliverySummary {
  const { job, record } = input;
  const levelsInRecord = [...new Set([...record.levels.map((l) => l.level), ...record.rooms.map((r) => r.level)])];
  const models = record.models.map((m) => ({
    structure: m.structureNote ? `${STRUCTURE_LABELS[m.structure]} (${m.structureNote})` : STRUCTURE_LABELS[m.structure],
    reference: m.platformReference || 'No reference recorded',
    split: m.splitReason ? `${SPLIT_REASON_LABELS[m.splitReason]}${m.splitNote ? `: ${m.splitNote}` : ''}` : null,
  }));
  const openGaps = record.gaps.filter((g) => !g.resolved);
  const notShown = [
    ...openGaps.map((g) => `Open coverage gap: ${g.location} (${GAP_CAUSE_LABELS[g.cause]})${g.note ? `: ${g.note}` : ''}`),
    ...record.rooms
      .filter((r) => r.stations === 0)
      .map((r) => `${r.name} (${LEVEL_LABELS[r.level]}): no stations; the room was not captured`),
    ...record.detachedStructures
      .filter((d) => !d.modelKey)
      .map((d) => `${d.name} (${STRUCTURE_LABELS[d.structure]}): not captured${d.noModelReason ? `: ${d.noModelReason}` : ''}`),
    ...record.detachedStructures
      .filter((d) => d.modelKey)
      .map((d) => {
        const model = record.models.find((m) => m.key === d.modelKey);
        return `${d.name} is delivered as a separate model${model?.platformReference ? ` (${model.platformReference})` : ''}`;
      }),
    ...record.rooms.flatMap((r) =>
      r.reflective
        .filter((x) => x.found > x.flagged)
        .map(
          (x) =>
            `${r.name}: ${x.found - x.flagged} ${REFLECTIVE_LABELS[x.kind].toLowerCase()}(s) not flagged; the model may show false openings there`,
        ),
    ),
  ];
  return {
    claimReference: job.claimReference,
    client: input.contacts.clientName ?? 'Not recorded',
    adjuster: input.contacts.adjusterName,
    property: `${job.street}, ${job.city} ${job.postcode}`,
    propertyType: PROPERTY_TYPE_LABELS[job.propertyType],
    loss: `${LOSS_TYPE_LABELS[job.lossType]} loss on ${job.lossDate}`,
    siteVisit: job.siteVisitDate ?? 'Not recorded',
    technician: input.technicianName,
    models,
    levels: levelsInRecord.map((level) => {
      const rooms = record.rooms.filter((r) => r.level === level);
      const counted = record.levels.find((l) => l.level === level)?.stations;
      return {
        level: LEVEL_LABELS[level],
        stations: counted ?? rooms.reduce((s, r) => s + r.stations, 0),
        rooms: rooms.map((r) => ({ name: r.name, size: roomSize(r, record.units), stations: r.stations, doorway: r.doorwayStation })),
      };
    }),
    plans: input.plans,
    damage: record.damageAreas.map((d) => ({
      room: damagePlaceName(record, d.roomKey),
      description: `${d.description} (${LOSS_TYPE_LABELS[d.lossType].toLowerCase()})`,
      stations: d.stationNumbers.length
        ? `Seen from station${d.stationNumbers.length > 1 ? 's' : ''} ${d.stationNumbers.join(', ')}`
        : 'No station recorded',
      photos: input.photos.filter((p) => d.photoFileIds.includes(p.id)),
    })),
    gaps: record.gaps.map((g) => ({ location: g.location, cause: GAP_CAUSE_LABELS[g.cause], resolved: g.resolved, note: g.note })),
    reflective: record.rooms.flatMap((r) =>
      r.reflective
        .filter((x) => x.found > 0)
        .map((x) => ({ room: r.name, kind: REFLECTIVE_LABELS[x.kind], found: x.found, flagged: x.flagged })),
    ),
    hazards: [...record.safety.hazards.map((h) => HAZARD_LABELS[h]), ...(record.safety.note ? [record.safety.note] : [])],
    qc: {
      score: input.review.score === null ? 'Not scored' : `${input.review.score.toFixed(1)} of 100`,
      passMark: `${input.review.passMark} of 100`,
      reviewer: input.review.reviewerName,
      decidedOn: input.review.decidedAt.slice(0, 10),
      revisions: input.revision,
    },
    notShown: notShown.length ? notShown : ['Nothing known: every room and structure in the record was captured and every gap resolved.'],
    footer: SUMMARY_FOOTER,
  };
}

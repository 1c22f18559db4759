// Who the capture is for and how to reach the site: entered by a manager on the job, read by
// the technician on the phone. Free text where the trade uses free text.
export type ClaimContacts = {
  clientName: string | null; // the carrier, third-party administrator or adjusting firm
  adjusterName: string | null;
  adjusterEmail: string | null;
  policyholderName: string | null;
  policyholderPhone: string | null;
  accessNotes: string | null; // key or lockbox, pets, occupants, hazards known before the visit
};

export const CONTACT_FIELDS = [
  'clientName',
  'adjusterName',
  'adjusterEmail',
  'policyholderName',
  'policyholderPhone',
  'accessNotes',
] as const satisfies readonly (keyof ClaimContacts)[];

export const CONTACT_LABELS: Record<keyof ClaimContacts, string> = {
  clientName: 'Client (carrier, administrator or adjusting firm)',
  adjusterName: 'Desk adjuster',
  adjusterEmail: "Desk adjuster's e-mail",
  policyholderName: 'Policyholder',
  policyholderPhone: "Policyholder's phone",
  accessNotes: 'Site access notes',
};

export const CONTACT_MAX_LENGTH: Record<keyof ClaimContacts, number> = {
  clientName: 120,
  adjusterName: 120,
  adjusterEmail: 254,
  policyholderName: 120,
  policyholderPhone: 40,
  accessNotes: 2000,
};

// Digits, spaces and the usual separators, with an optional leading +.
export const PHONE_PATTERN = /^\+?[0-9 ().-]{5,40}$/;

export function emptyContacts(): ClaimContacts {
  return { clientName: null, adjusterName: null, adjusterEmail: null, policyholderName: null, policyholderPhone: null, accessNotes: null };
}

// tel: link for a typed phone number (RFC 3966 keeps only digits and a leading +).
export function telHref(phone: string): string {
  const trimmed = phone.trim();
  return `tel:${trimmed.startsWith('+') ? '+' : ''}${trimmed.replace(/\D/g, '')}`;
}

// Opens the device's own map app on the address (RFC 5870 geo: URI with a query; other
// phones register the maps: scheme). No map service is embedded in Sightline.
export function mapHref(address: string, platform: 'android' | 'other'): string {
  const q = encodeURIComponent(address);
  return platform === 'android' ? `geo:0,0?q=${q}` : `maps:?q=${q}`;
}

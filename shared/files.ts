export const FILE_KINDS = ['photo', 'sketch', 'station_coordinates'] as const;
export type FileKind = (typeof FILE_KINDS)[number];

export const FILE_KIND_LABELS: Record<FileKind, string> = {
  photo: 'Photo',
  sketch: 'Floor sketch or station map',
  station_coordinates: 'Station coordinate file',
};

// Content types accepted per kind, decided by the file's bytes, never its name.
export const ACCEPTED_TYPES: Record<FileKind, string[]> = {
  photo: ['image/jpeg', 'image/png', 'image/webp'],
  sketch: ['image/png', 'application/pdf'],
  station_coordinates: ['text/csv'],
};

export const ACCEPTED_DESCRIPTION: Record<FileKind, string> = {
  photo: 'JPEG, PNG or WebP',
  sketch: 'PNG or PDF',
  station_coordinates: 'CSV text',
};

export type StoredFile = {
  id: number;
  kind: FileKind;
  name: string;
  contentType: string;
  sizeBytes: number;
  sha256: string;
  uploadedAt: string;
};

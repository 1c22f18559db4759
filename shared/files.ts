// 'summary' is the delivery PDF Sightline builds itself; technicians upload the other kinds.
export const FILE_KINDS = ['photo', 'sketch', 'station_coordinates', 'summary'] as const;
export const UPLOAD_KINDS = ['photo', 'sketch', 'station_coordinates'] as const;
export type FileKind = (typeof FILE_KINDS)[number];
export type UploadKind = (typeof UPLOAD_KINDS)[number];

export const FILE_KIND_LABELS: Record<FileKind, string> = {
  photo: 'Photo',
  sketch: 'Floor sketch or station map',
  station_coordinates: 'Station coordinate file',
  summary: 'Acceptance summary (PDF)',
};

// Content types accepted per kind, decided by the file's bytes, never its name.
export const ACCEPTED_TYPES: Record<UploadKind, string[]> = {
  photo: ['image/jpeg', 'image/png', 'image/webp'],
  sketch: ['image/png', 'application/pdf'],
  station_coordinates: ['text/csv'],
};

export const ACCEPTED_DESCRIPTION: Record<UploadKind, string> = {
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
  // A photo's caption; absent on files stored before captions existed.
  caption?: string | null;
};

export const CAPTION_MAX_LENGTH = 300;

// The default upload limit; the server's UPLOAD_MAX_MB may lower or raise it.
export const DEFAULT_UPLOAD_MAX_MB = 25;
export const DEFAULT_UPLOAD_MAX_BYTES = DEFAULT_UPLOAD_MAX_MB * 1024 * 1024;

const KIND_PLURAL: Record<FileKind, string> = {
  photo: 'Photos',
  sketch: 'Floor sketches',
  station_coordinates: 'Station files',
  summary: 'Summaries',
};

const megabytes = (bytes: number) => `${Math.round((bytes / 1024 / 1024) * 10) / 10} MB`;

export function fileTooLargeMessage(maxBytes: number, bytes?: number, kind?: FileKind): string {
  const what = kind ? KIND_PLURAL[kind] : 'Files';
  return `${what} up to ${megabytes(maxBytes)}${bytes !== undefined ? `; this one is ${megabytes(bytes)}` : ''}.`;
}

// Checked on the phone before anything is sent: a file that can never pass is not uploaded.
// The content type the browser reports is only a first check; the server reads the bytes.
export function uploadProblem(kind: UploadKind, file: { size: number; type: string }, maxBytes = DEFAULT_UPLOAD_MAX_BYTES): string | null {
  if (file.size === 0) return 'This file is empty.';
  if (file.size > maxBytes) return fileTooLargeMessage(maxBytes, file.size, kind);
  const csvLike = kind === 'station_coordinates' && (file.type === '' || /csv|text\/plain|excel/.test(file.type));
  if (file.type && !csvLike && !ACCEPTED_TYPES[kind].includes(file.type)) {
    return `${KIND_PLURAL[kind]} must be ${ACCEPTED_DESCRIPTION[kind]}; this one is ${file.type}.`;
  }
  return null;
}

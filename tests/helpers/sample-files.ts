// Smallest valid files of each type, built in the test so no binary fixtures are needed.
export const PNG_1X1 = Buffer.from(
  'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==',
  'base64',
);

// JPEG start-of-image and JFIF header are enough for content sniffing.
export const JPEG_HEADER = Buffer.concat([
  Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10, 0x4a, 0x46, 0x49, 0x46, 0x00, 0x01, 0x01, 0x00, 0x00, 0x01, 0x00, 0x01, 0x00, 0x00]),
  Buffer.alloc(64, 0),
  Buffer.from([0xff, 0xd9]),
]);

export const PDF_MINIMAL = Buffer.from('%PDF-1.4\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n');

export const STATION_CSV = Buffer.from(
  'station,level,x,y,unit,room,kind\n1,ground,0,0,ft,Kitchen,station\n2,ground,5,0,ft,Kitchen,station\n',
);

// An executable's header with an image's file name: must be refused.
export const EXE_AS_JPG = Buffer.concat([Buffer.from('MZ'), Buffer.alloc(200, 0x90)]);

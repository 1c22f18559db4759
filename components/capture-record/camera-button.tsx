// Native builds pick photos through the document picker; the camera button is web-only.
export function CameraButton(_props: { onFiles: (files: File[]) => void }) {
  return null;
}

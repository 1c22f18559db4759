// On the web build: take photos straight from the phone's camera where the browser allows
// (the `capture` attribute), several at once where it does not.
import { createElement, useRef } from 'react';
import { View } from 'react-native';

import { Button } from '@/components/ui/button';

export function CameraButton({ onFiles }: { onFiles: (files: File[]) => void }) {
  const input = useRef<HTMLInputElement | null>(null);
  return (
    <View>
      <Button label="Take photos" tone="secondary" onPress={() => input.current?.click()} />
      {createElement('input', {
        ref: input,
        type: 'file',
        accept: 'image/*',
        capture: 'environment',
        multiple: true,
        'aria-label': 'Take photos',
        style: { display: 'none' },
        onChange: (e: { target: HTMLInputElement }) => {
          const files = Array.from(e.target.files ?? []);
          e.target.value = '';
          if (files.length) onFiles(files);
        },
      })}
    </View>
  );
}

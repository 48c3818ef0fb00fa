import { useRef } from 'react';

import { Button } from '@/modules/theme/ui/button';

interface WavFilePickerProps {
  onFile: (file: Blob, name: string) => void;
  disabled?: boolean;
  testID: string;
}

/** "Upload a WAV file": the browser's own file chooser behind one of our buttons. */
export function WavFilePicker({ onFile, disabled, testID }: WavFilePickerProps) {
  const input = useRef<HTMLInputElement>(null);
  return (
    <>
      <Button label="Upload a WAV file" variant="secondary" onPress={() => input.current?.click()} disabled={disabled} testID={testID} />
      <input
        ref={input}
        type="file"
        accept=".wav,audio/wav,audio/x-wav,audio/wave"
        style={{ display: 'none' }}
        aria-hidden
        tabIndex={-1}
        data-testid={`${testID}-file`}
        onChange={(event) => {
          const file = event.target.files?.[0];
          event.target.value = '';
          if (file) onFile(file, file.name);
        }}
      />
    </>
  );
}

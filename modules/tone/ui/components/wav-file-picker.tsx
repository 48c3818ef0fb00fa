interface WavFilePickerProps {
  onFile: (file: Blob, name: string) => void;
  disabled?: boolean;
  testID: string;
}

/** Choosing a WAV from files is offered on the web app only. */
export function WavFilePicker(_props: WavFilePickerProps) {
  return null;
}

import { IonButton, IonSpinner } from '@ionic/react';
import { useRef, useState } from 'react';
import { preparePhoto } from '../../inspect/photo';
import type { PhotoToKeep } from '../../offline/records';
import { useBlobUrl } from '../useBlobUrl';

interface PhotoPickerProps {
  photo: PhotoToKeep | undefined;
  onChange(photo: PhotoToKeep | undefined): void;
}

/** Camera or file; the picture is resized here and never leaves the tablet until sync. */
export function PhotoPicker({ photo, onChange }: PhotoPickerProps) {
  const camera = useRef<HTMLInputElement>(null);
  const file = useRef<HTMLInputElement>(null);
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string>();
  const preview = useBlobUrl(photo?.blob);

  const take = async (input: HTMLInputElement) => {
    const chosen = input.files?.[0];
    input.value = '';
    if (!chosen) return;
    setBusy(true);
    setProblem(undefined);
    try {
      onChange(await preparePhoto(chosen));
    } catch {
      setProblem('That file is not a photo this tablet can read.');
    } finally {
      setBusy(false);
    }
  };

  return (
    <div className="photo-picker">
      <input
        ref={camera}
        type="file"
        accept="image/*"
        capture="environment"
        hidden
        onChange={(event) => void take(event.target)}
      />
      <input
        ref={file}
        type="file"
        accept="image/jpeg,image/png,image/webp"
        hidden
        data-testid="photo-file"
        onChange={(event) => void take(event.target)}
      />
      <div className="form-actions">
        <IonButton onClick={() => camera.current?.click()} disabled={busy}>
          Take a photo
        </IonButton>
        <IonButton fill="outline" onClick={() => file.current?.click()} disabled={busy}>
          Choose a file
        </IonButton>
        {photo && (
          <IonButton fill="clear" color="danger" onClick={() => onChange(undefined)}>
            Remove photo
          </IonButton>
        )}
        {busy && <IonSpinner />}
      </div>
      {problem && (
        <p className="field-error" role="alert">
          {problem}
        </p>
      )}
      {preview && photo && (
        <figure className="photo-preview">
          <img src={preview} alt="The defect as photographed" data-testid="photo-preview" />
          <figcaption>
            {photo.width} × {photo.height} px, {Math.round(photo.blob.size / 1024)} KB, kept on this
            tablet until it is sent
          </figcaption>
        </figure>
      )}
    </div>
  );
}

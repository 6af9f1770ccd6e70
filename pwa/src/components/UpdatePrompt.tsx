import { useEffect, useRef, useState } from 'react';
import { IonToast } from '@ionic/react';
import { Workbox } from 'workbox-window';

/**
 * Registers the service worker and, when a newer build is waiting, offers to switch to it.
 * The new version never takes over by itself: an inspector may be mid-entry.
 */
export function UpdatePrompt() {
  const workbox = useRef<Workbox | null>(null);
  const [waiting, setWaiting] = useState(false);

  useEffect(() => {
    if (!import.meta.env.PROD || !('serviceWorker' in navigator)) return;
    const wb = new Workbox('/sw.js');
    wb.addEventListener('waiting', () => setWaiting(true));
    wb.addEventListener('controlling', (event) => {
      if (event.isUpdate) window.location.reload();
    });
    void wb.register();
    workbox.current = wb;
  }, []);

  return (
    <IonToast
      isOpen={waiting}
      message="A new version of Gumshoe is ready."
      position="bottom"
      buttons={[
        { text: 'Later', role: 'cancel', handler: () => setWaiting(false) },
        { text: 'Switch now', handler: () => workbox.current?.messageSkipWaiting() },
      ]}
    />
  );
}

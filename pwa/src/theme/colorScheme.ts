import { useEffect, useState } from 'react';

export type ColorScheme = 'device' | 'light' | 'dark';

const KEY = 'gumshoe.colorScheme';
const darkQuery = () => window.matchMedia?.('(prefers-color-scheme: dark)');

function apply(scheme: ColorScheme): void {
  const dark = scheme === 'dark' || (scheme === 'device' && !!darkQuery()?.matches);
  document.documentElement.classList.toggle('ion-palette-dark', dark);
}

function stored(): ColorScheme {
  const value = localStorage.getItem(KEY);
  return value === 'light' || value === 'dark' ? value : 'device';
}

/** Light, dark, or whatever the tablet is set to (night shifts); a choice of this device. */
export function useColorScheme(): [ColorScheme, (scheme: ColorScheme) => void] {
  const [scheme, setScheme] = useState<ColorScheme>(stored);
  useEffect(() => {
    apply(scheme);
    const query = darkQuery();
    if (scheme !== 'device' || !query) return;
    const follow = () => apply('device');
    query.addEventListener('change', follow);
    return () => query.removeEventListener('change', follow);
  }, [scheme]);
  return [
    scheme,
    (next) => {
      localStorage.setItem(KEY, next);
      setScheme(next);
    },
  ];
}

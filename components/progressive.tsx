"use client";
import { useEffect, useState, type ComponentType, type ReactNode } from "react";

/**
 * Shows `children` (what the server rendered) until `load()` has fetched the interactive component
 * after the first paint, then renders that component with `props` in its place. The interactive
 * code is a lazily loaded chunk, so it is not part of the page's first load; if it fails to load,
 * the server's version stays.
 */
export function Progressive<P extends object>({ load, props, children }: { load: () => Promise<ComponentType<P>>; props: P; children: ReactNode }) {
  const [Loaded, setLoaded] = useState<ComponentType<P> | null>(null);
  useEffect(() => {
    let live = true;
    load().then(
      (c) => live && setLoaded(() => c),
      () => undefined,
    );
    return () => {
      live = false;
    };
    // `load` is a module-level import thunk: loading once per mount is intended.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, []);
  return Loaded ? <Loaded {...props} /> : <>{children}</>;
}

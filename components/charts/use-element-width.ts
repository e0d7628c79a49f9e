"use client";

import { useLayoutEffect, useRef, useState } from "react";

/**
 * Width of a container, kept current with a ResizeObserver. The plots size
 * themselves from it (and some keep equal x and y scales, which a CSS aspect
 * ratio alone cannot do once axis margins are added).
 */
export function useElementWidth<T extends HTMLElement>() {
  const ref = useRef<T>(null);
  const [width, setWidth] = useState(0);
  useLayoutEffect(() => {
    const el = ref.current;
    if (!el) return;
    setWidth(Math.floor(el.getBoundingClientRect().width));
    const observer = new ResizeObserver((entries) => {
      const w = Math.floor(entries[0]?.contentRect.width ?? 0);
      setWidth((old) => (Math.abs(old - w) >= 1 ? w : old));
    });
    observer.observe(el);
    return () => observer.disconnect();
  }, []);
  return { ref, width };
}

import { useEffect, useRef, useState } from "react";

/**
 * The width available to the chart (at least 480 px), followed as the page
 * resizes; `ready` turns true once it has been measured (the e2e tests and
 * the bench wait for it).
 */
export function useChartWidth() {
  const wrapRef = useRef<HTMLDivElement>(null);
  const [width, setWidth] = useState(1100);
  const [ready, setReady] = useState(false);
  useEffect(() => {
    const el = wrapRef.current;
    if (!el) return;
    setWidth(Math.max(480, Math.floor(el.getBoundingClientRect().width)));
    setReady(true);
    const ro = new ResizeObserver(([e]) => e && setWidth(Math.max(480, Math.floor(e.contentRect.width))));
    ro.observe(el);
    return () => ro.disconnect();
  }, []);
  return { wrapRef, width, ready };
}

"use client";
import { useEffect, useRef, useState, type ReactNode } from "react";

interface WhenNearProps {
  /** Mounted once the placeholder comes within `marginPx` of the screen, and kept from then on. */
  children: ReactNode;
  /** Shown until then, at the size the children will take, so nothing below moves when they arrive. */
  placeholder: ReactNode;
  marginPx?: number;
}

/**
 * Defers heavy content (a chart library and the sweeps it draws) until the person scrolls near it:
 * a page then hydrates and answers input first, and what is off screen costs nothing until needed.
 */
export function WhenNear({ children, placeholder, marginPx = 400 }: WhenNearProps) {
  const anchor = useRef<HTMLDivElement>(null);
  const [near, setNear] = useState(false);
  useEffect(() => {
    const element = anchor.current;
    if (near || !element) return;
    const observer = new IntersectionObserver((entries) => entries.some((entry) => entry.isIntersecting) && setNear(true), {
      rootMargin: `${marginPx}px 0px`,
    });
    observer.observe(element);
    return () => observer.disconnect();
  }, [near, marginPx]);
  if (near) return <>{children}</>;
  return <div ref={anchor}>{placeholder}</div>;
}

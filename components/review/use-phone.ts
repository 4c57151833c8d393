"use client";

import { useSyncExternalStore } from "react";

const QUERY = "(max-width: 767px)";

/** True on a phone-sized screen (below Tailwind's md). The server, and hydration, assume a wider one. */
export function usePhone(): boolean {
  return useSyncExternalStore(
    (onChange) => {
      const mq = window.matchMedia(QUERY);
      mq.addEventListener("change", onChange);
      return () => mq.removeEventListener("change", onChange);
    },
    () => window.matchMedia(QUERY).matches,
    () => false,
  );
}

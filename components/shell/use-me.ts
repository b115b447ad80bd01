"use client";

import { useQuery } from "@tanstack/react-query";
import type { RoleName } from "@/lib/auth/roles";
import { fetchJson } from "@/components/ui/fetch-json";

export type Me = {
  id: string;
  email: string;
  displayName: string;
  role: RoleName;
  lengthUnits: "metric" | "imperial";
  temperatureUnit: "C" | "F";
};

export function useMe() {
  return useQuery({
    queryKey: ["me"],
    queryFn: async () => (await fetchJson<{ user: Me }>("/api/v1/me")).user,
  });
}

import { peopleSchema, type People } from "@hushmark/schemas";
import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "../../../lib/api-client";
import { peopleKeys } from "./keys";

export function getPeople(signal?: AbortSignal): Promise<People> {
  return api.get("/people", peopleSchema, signal);
}

export const peopleQueryOptions = () =>
  queryOptions({
    queryKey: peopleKeys.list(),
    queryFn: ({ signal }) => getPeople(signal),
  });

export function usePeople() {
  return useQuery(peopleQueryOptions());
}

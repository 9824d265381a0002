// The finder page reads the public API's body; its types are the engine's own.
export type { Alternative as Candidate, Alternatives as AlternativesResponse, NearMiss } from "@/lib/alternatives/find-alternatives";
export type { ApiErrorBody } from "@/lib/api/errors";

import { openApiDocument } from "@/lib/api/openapi/app-document";
import { contractChecker } from "./contract-checker";

export { pointerTo } from "./contract-checker";

/**
 * The app's OpenAPI document and its checker. Every API test's helper (callRoute and the like)
 * passes each answer through checkContract, so every API test is also a test of the description.
 */
export const apiDocument = openApiDocument();
export const { checkContract, validatorAt } = contractChecker(apiDocument);

export * from "./errors.js";
export * from "./roles.js";
export * from "./auth.js";
export * from "./people.js";
export * from "./projects.js";
export * from "./plans.js";
export * from "./analyses.js";
export * from "./catalogue.js";

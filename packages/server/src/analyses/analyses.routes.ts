import { analysisRequestSchema, projectIdParamSchema } from "@hushmark/schemas";
import { parse } from "../http/parse.js";
import type { RouteSpec } from "../http/routes.js";
import type { AnalysesService } from "./analyses.service.js";

/** Analysis routes, mounted under `/projects`. Clients may run them on their own projects (read-only). */
export function analysisRoutes(analyses: AnalysesService): RouteSpec[] {
  return [
    {
      method: "post", path: "/:projectId/analyses", access: "signed-in",
      handler: async ({ req, actor }) => analyses.analyse(actor, parse(projectIdParamSchema, req.params).projectId, parse(analysisRequestSchema, req.body)),
    },
    {
      // The marked-up plan of the same analysis as a PDF for print (POST: it takes the same inputs).
      method: "post", path: "/:projectId/analyses/drawing", access: "signed-in",
      handler: async ({ req, res, actor }) => {
        const file = await analyses.drawing(actor, parse(projectIdParamSchema, req.params).projectId, parse(analysisRequestSchema, req.body));
        res.type("application/pdf").attachment(file.filename).set({ "x-content-type-options": "nosniff" }).send(file.bytes);
        return undefined;
      },
    },
  ];
}

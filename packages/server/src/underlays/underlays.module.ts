import type { DataSource } from "typeorm";
import type { AppConfig } from "../config.js";
import { createFilesService } from "../files/files.service.js";
import { createObjectStorage, type ObjectStorage } from "../files/object-storage.js";
import type { RouteSpec } from "../http/routes.js";
import type { ProjectsService } from "../projects/projects.service.js";
import { underlayRoutes } from "./underlays.routes.js";
import { createUnderlaysService } from "./underlays.service.js";

export interface UnderlaysModuleOptions {
  maxBytes?: number;
  maxPixels?: number;
}

/**
 * Underlay images: their routes (under `/projects`) over the same object store as recordings and
 * photos (the store given, or one of its own from the configuration, closed with the module).
 */
export function createUnderlaysModule(deps: { dataSource: DataSource; config: AppConfig; projects: ProjectsService; storage?: ObjectStorage; options?: UnderlaysModuleOptions }): { routes: RouteSpec[]; close: () => void } {
  const storage = deps.storage ?? createObjectStorage(deps.config.s3);
  const files = createFilesService(deps.dataSource, storage);
  const service = createUnderlaysService(deps.dataSource, deps.projects, files, { maxPixels: deps.options?.maxPixels });
  return {
    routes: underlayRoutes(service, { maxBytes: deps.options?.maxBytes }),
    close: () => {
      if (!deps.storage) storage.close();
    },
  };
}

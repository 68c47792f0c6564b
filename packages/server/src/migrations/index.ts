import { InitialSchema1796149875228 } from "./1796149875228-InitialSchema.js";
import { AnalysisCache1796150944729 } from "./1796150944729-AnalysisCache.js";
import { FirmConstructions1796151221092 } from "./1796151221092-FirmConstructions.js";
import { IntakeMeasurementsFiles1796151662461 } from "./1796151662461-IntakeMeasurementsFiles.js";
import { ProposalsAndPayments1796152691589 } from "./1796152691589-ProposalsAndPayments.js";
import { OptionSearches1796158450587 } from "./1796158450587-OptionSearches.js";
import { UnderlayFiles1796158669431 } from "./1796158669431-UnderlayFiles.js";
import { PdfsInObjectStorage1796159000000 } from "./1796159000000-PdfsInObjectStorage.js";
import { ProjectSiteLocation1796160000000 } from "./1796160000000-ProjectSiteLocation.js";
import { FirmConstructionsVersion1796161000000 } from "./1796161000000-FirmConstructionsVersion.js";
import { OutboxMails1796162364248 } from "./1796162364248-OutboxMails.js";

/**
 * Every migration in order. A new one is generated with
 * `npm run -w @hushmark/server migration:generate -- src/migrations/Name` and appended here.
 */
export const migrations = [InitialSchema1796149875228, AnalysisCache1796150944729, FirmConstructions1796151221092, IntakeMeasurementsFiles1796151662461, ProposalsAndPayments1796152691589, OptionSearches1796158450587, UnderlayFiles1796158669431, PdfsInObjectStorage1796159000000, ProjectSiteLocation1796160000000, FirmConstructionsVersion1796161000000, OutboxMails1796162364248];

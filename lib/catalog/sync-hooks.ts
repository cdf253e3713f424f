import "server-only";
// Registers every area's catalog-sync step (imported by the seed and the admin's sync action).
import { syncQuestionVersions } from "@/lib/quiz";
import { recordMaterialChanges } from "@/lib/refreshers";
import { syncBoardCells } from "@/lib/team";
import { onCatalogSync } from "./sync";

onCatalogSync(syncQuestionVersions);
onCatalogSync(recordMaterialChanges);
onCatalogSync(syncBoardCells);

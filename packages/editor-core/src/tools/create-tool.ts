import type { Tool, ToolEnv, ToolId } from "./tool.js";
import { SelectTool } from "./select/select-tool.js";
import { RectangleTool } from "./rectangle/rectangle-tool.js";
import { PolygonTool } from "./polygon/polygon-tool.js";
import { CornersTool } from "./corners/corners-tool.js";
import { WallTool } from "./wall/wall-tool.js";
import { OpeningTool } from "./opening/opening-tool.js";
import { VentTool } from "./vent/vent-tool.js";
import { DuctLinkTool } from "./duct-link/duct-link-tool.js";
import { MarkTool } from "./mark/mark-tool.js";
import { TapeTool } from "./tape/tape-tool.js";
import { PanTool } from "./pan/pan-tool.js";

export function createTool(id: ToolId, env: ToolEnv): Tool {
  switch (id) {
    case "select": return new SelectTool(env);
    case "room-rectangle": return new RectangleTool(env, "room");
    case "void": return new RectangleTool(env, "void");
    case "room-polygon": return new PolygonTool(env);
    case "corners": return new CornersTool(env);
    case "wall": return new WallTool(env);
    case "door": return new OpeningTool(env, "door");
    case "window": return new OpeningTool(env, "window");
    case "gap": return new OpeningTool(env, "penetration");
    case "vent": return new VentTool(env);
    case "duct-link": return new DuctLinkTool(env);
    case "pin": return new MarkTool(env, "pin");
    case "note": return new MarkTool(env, "note");
    case "tape": return new TapeTool(env);
    case "pan": return new PanTool(env);
  }
}

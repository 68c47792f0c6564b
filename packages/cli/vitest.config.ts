import { fileURLToPath } from "node:url";
import { defineConfig } from "vitest/config";

// Tests run the engine from its sources, so they need no build of @hushmark/acoustics.
export default defineConfig({
  resolve: {
    alias: { "@hushmark/acoustics": fileURLToPath(new URL("../acoustics/src/index.ts", import.meta.url)) },
  },
});

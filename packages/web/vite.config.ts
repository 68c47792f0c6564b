import { fileURLToPath } from "node:url";
import tailwindcss from "@tailwindcss/vite";
import react from "@vitejs/plugin-react";
import { defineConfig, type ProxyOptions } from "vite";

const apiTarget = "http://127.0.0.1:8080";

// The server refuses state-changing requests from an Origin other than its own (CSRF guard);
// behind this proxy the browser's origin is Vite's, so present the request as the server's own.
const proxy: Record<string, ProxyOptions> = Object.fromEntries(
  ["/api", "/dev"].map((prefix) => [
    prefix,
    {
      target: apiTarget,
      configure: (server) => {
        server.on("proxyReq", (request) => {
          if (request.getHeader("origin")) request.setHeader("origin", apiTarget);
        });
      },
    } satisfies ProxyOptions,
  ]),
);

export default defineConfig({
  plugins: [react(), tailwindcss()],
  resolve: {
    // Read the shared schemas from source so the web app never runs against a stale build of them.
    alias: {
      "@hushmark/schemas": fileURLToPath(new URL("../schemas/src/index.ts", import.meta.url)),
    },
  },
  server: { proxy },
  preview: { proxy },
  build: {
    outDir: "dist",
    emptyOutDir: true,
    sourcemap: true,
    rolldownOptions: {
      output: {
        // Libraries change far less often than our code; separate chunks keep them cached across releases.
        codeSplitting: {
          groups: [
            // Underlay converters load only when a PDF or HEIC file is chosen (dynamic import), never with the page.
            { name: "pdf", test: /node_modules[\\/]pdfjs-dist[\\/]/, priority: 40 },
            { name: "heic", test: /node_modules[\\/]heic2any[\\/]/, priority: 40 },
            // The plan editor's libraries load only with the Sketch and Paths sections.
            { name: "canvas", test: /node_modules[\\/](konva|react-konva|react-reconciler|its-fine|immer|@turf|rbush|quickselect|robust-predicates|splaytree|polyclip-ts|polygon-clipping|concaveman|earcut|tinyqueue|point-in-polygon|sweepline-intersections|geojson-equality-ts|topojson-client|topojson-server|d3-voronoi|marchingsquares|skmeans|@hushmark)[\\/]/, priority: 15 },
            { name: "react", test: /node_modules[\\/](react|react-dom|scheduler|react-router|react-router-dom)[\\/]/, priority: 30 },
            { name: "data", test: /node_modules[\\/](@tanstack|zod|react-hook-form|@hookform)[\\/]/, priority: 20 },
            { name: "vendor", test: /node_modules[\\/]/, priority: 10 },
          ],
        },
      },
    },
  },
});

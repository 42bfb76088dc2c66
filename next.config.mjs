/** @type {import('next').NextConfig} */
const nextConfig = {
  // pg and the SMTP/mail packages use Node built-ins; keep them out of the bundle. tinypool starts its
  // workers from its own files, so it must stay where npm put it.
  serverExternalPackages: ["pg", "nodemailer", "highs", "pdfjs-dist", "tinypool"],
  // The PDF inspection worker is loaded from disk at run time (lib/pdf/inspect-pool.ts), which file tracing
  // cannot see; keep it, and the pdf.js build it imports, in any traced deployment (output: "standalone").
  outputFileTracingIncludes: {
    "/api/**": ["./lib/pdf/inspect-worker.mjs", "./lib/pdf/pdfjs-node.mjs", "./node_modules/pdfjs-dist/legacy/build/**", "./node_modules/tinypool/dist/**"],
  },
  poweredByHeader: false,
  // Tests build into their own folder so a running demo keeps its build.
  distDir: process.env.NEXT_DIST_DIR ?? ".next",
  typedRoutes: false,
};

export default nextConfig;

import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  // The test run builds into its own folder so it never clashes with a running dev or demo server.
  distDir: process.env.NEXT_DIST_DIR ?? ".next",
  poweredByHeader: false,
  serverExternalPackages: ["pg", "sharp", "bcryptjs", "nodemailer", "graphile-worker"],
  // Types are checked once, for the whole repository, by `tsc` in the test run.
  typescript: { ignoreBuildErrors: true },
};

export default nextConfig;

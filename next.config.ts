import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  serverExternalPackages: ["jsdom", "pdfkit", "svg-to-pdfkit", "opensheetmusicdisplay"],
};

export default nextConfig;

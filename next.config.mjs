/** @type {import('next').NextConfig} */
const nextConfig = {
  // Tests build into their own folder so `npm test` never clobbers a running `npm start`.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  serverExternalPackages: ["mysql2", "archiver", "@node-rs/argon2", "pdfkit", "piscina", "sharp"],
  poweredByHeader: false,
  typedRoutes: false,
};
export default nextConfig;

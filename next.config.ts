import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  poweredByHeader: false,
  // The test command builds into its own folder so it never disturbs a running start command.
  distDir: process.env.NEXT_DIST_DIR ?? ".next",
  reactStrictMode: true,
  // forbidden() and forbidden.tsx render our 403 page.
  experimental: { authInterrupts: true },
  serverExternalPackages: ["@node-rs/argon2", "mysql2"],
  async headers() {
    const https = (process.env.APP_URL ?? "").startsWith("https://");
    const common = [
      { key: "X-Content-Type-Options", value: "nosniff" },
      { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
      { key: "X-Frame-Options", value: "DENY" },
      { key: "Permissions-Policy", value: "camera=(self), geolocation=(), microphone=()" },
      ...(https ? [{ key: "Strict-Transport-Security", value: "max-age=63072000; includeSubDomains" }] : []),
    ];
    return [
      { source: "/:path*", headers: common },
      // Signed-in pages and the API carry personal data: never cache them anywhere.
      {
        source: "/(dashboard|presses|inspections|bookings|shop|account|api)(.*)",
        headers: [{ key: "Cache-Control", value: "no-store" }],
      },
    ];
  },
};

export default nextConfig;

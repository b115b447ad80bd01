import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  poweredByHeader: false,
  // Budget results are 100–300 kB of JSON; gzip in the Node process costs more time than the
  // solve itself on a small machine. In production the reverse proxy compresses (README).
  compress: false,
  serverExternalPackages: ["@node-rs/argon2", "mysql2"],
};

export default nextConfig;

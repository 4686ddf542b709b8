declare module "virtual:precache-manifest" {
  const manifest: { url: string; revision: string | null }[];
  export default manifest;
}

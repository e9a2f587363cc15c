// Types of devCertificate.mjs for the TypeScript tests that import it.
/** What the shell npm start runs in can do. */
export interface Shell {
  root: boolean;
  sudo: boolean;
  certutil: boolean;
}
export function has(cmd: string): boolean;
export function currentShell(): Shell;
export function asRoot(command: string, shell: Shell): string;
export function nssTrustSteps(certFile: string, isCa: boolean, shell?: Shell): string;
export function systemTrustStep(certFile: string, shell?: Shell): string;
export function selfSignedLeaf(dir: string): Promise<{ key: string; cert: string }>;

/** Types of scripts/chromiumSetup.mjs (plain JavaScript: it runs before any dependency is installed). */
export declare const DEFAULT_CHROMIUM: string
export declare const APT_INSTALL: readonly (readonly [string, readonly string[]])[]

export interface ChromiumFacts {
  readonly override: string | undefined
  readonly exists: (path: string) => boolean
  readonly uid: number | undefined
  readonly platform: string
  readonly aptGet: string | null
}

export type ChromiumSetup =
  | { readonly kind: 'ok'; readonly path: string }
  | { readonly kind: 'install'; readonly path: string; readonly log: string; readonly commands: typeof APT_INSTALL }
  | { readonly kind: 'fail'; readonly message: string; readonly command: string }

export declare function decideChromiumSetup(facts: ChromiumFacts): ChromiumSetup

// Where the browser tests look for Chromium: CHROMIUM_PATH, else Debian's package.
export const CHROMIUM_PATH = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";

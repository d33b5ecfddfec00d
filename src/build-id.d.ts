/** Set by vite.config.ts at each build: data a device keeps is read only by the build that wrote it. */
declare const __SATURA_BUILD__: string;

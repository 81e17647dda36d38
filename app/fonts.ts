import localFont from "next/font/local";

// Fonts ship with the app (from @fontsource in node_modules): nothing is fetched at build or run time.
export const serif = localFont({
  src: [
    { path: "../node_modules/@fontsource/eb-garamond/files/eb-garamond-latin-400-normal.woff2", weight: "400", style: "normal" },
    { path: "../node_modules/@fontsource/eb-garamond/files/eb-garamond-latin-400-italic.woff2", weight: "400", style: "italic" },
    { path: "../node_modules/@fontsource/eb-garamond/files/eb-garamond-latin-600-normal.woff2", weight: "600", style: "normal" },
  ],
  variable: "--font-serif-face",
  display: "swap",
});

export const sans = localFont({
  src: [
    { path: "../node_modules/@fontsource-variable/source-sans-3/files/source-sans-3-latin-wght-normal.woff2", weight: "200 900", style: "normal" },
    { path: "../node_modules/@fontsource-variable/source-sans-3/files/source-sans-3-latin-wght-italic.woff2", weight: "200 900", style: "italic" },
  ],
  variable: "--font-sans-face",
  display: "swap",
});

export const mono = localFont({
  src: [{ path: "../node_modules/@fontsource-variable/jetbrains-mono/files/jetbrains-mono-latin-wght-normal.woff2", weight: "100 800", style: "normal" }],
  variable: "--font-mono-face",
  display: "swap",
});

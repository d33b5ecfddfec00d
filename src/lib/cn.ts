import { clsx, type ClassValue } from "clsx";
import { createTailwindMerge } from "tailwind-merge";

/**
 * Which Tailwind classes replace which, for the utilities this app writes. tailwind-merge's own
 * table covers every utility Tailwind has and was 8.8 kB (brotli) of every first page, the
 * sign-in screen's included; with this one cn is 3.8 kB. Each group names its classes' first words
 * and takes any value after them (`min-h-touch`, `min-h-14`), except where words share a start:
 * there the exact words pick the group first (`text-xl` is a size, `text-ink` a colour;
 * `border-2` a width, `border-rule` a colour). tests/client/lib/cn.test.ts checks that every pair
 * of classes in src/ merges as tailwind-merge's full table would: a utility added to src/
 * without a group here fails there.
 */
const anyValue = () => true;
const isWidth = (value: string) => /^\d+$/.test(value);
/** A position's offset: a step of the scale, a fraction, `px`, `full`, `auto` or an arbitrary value. */
const isOffset = (value: string) => /^(\d+(\.\d+)?|\d+\/\d+|px|full|auto|\[.+\])$/.test(value);
const SIDES = ["t", "r", "b", "l", "x", "y"] as const;
const FONT_SIZES = ["xs", "sm", "base", "lg", "xl", "2xl", "3xl", "4xl", "5xl", "6xl", "7xl", "8xl", "9xl"];
const DISPLAYS = [
  "block",
  "inline-block",
  "inline",
  "flex",
  "inline-flex",
  "grid",
  "inline-grid",
  "contents",
  "hidden",
];
const TABLE_DISPLAYS = ["table", "table-row", "table-cell", "table-header-group", "table-row-group", "table-caption"];

const byWord = (word: string) => [{ [word]: [anyValue] }];

const twMerge = createTailwindMerge(() => ({
  cacheSize: 500,
  theme: {},
  classGroups: {
    display: [...DISPLAYS, ...TABLE_DISPLAYS],
    "sr-only": ["sr-only"],
    "not-sr-only": ["not-sr-only"],
    position: ["static", "fixed", "absolute", "relative", "sticky"],
    visibility: ["visible", "invisible", "collapse"],
    overflow: byWord("overflow"),
    "overflow-x": byWord("overflow-x"),
    "overflow-y": byWord("overflow-y"),
    inset: [{ inset: [isOffset] }],
    "inset-x": [{ "inset-x": [isOffset] }],
    top: [{ top: [isOffset] }],
    right: [{ right: [isOffset] }],
    bottom: [{ bottom: [isOffset] }],
    left: [{ left: [isOffset] }],
    z: byWord("z"),
    // Flexbox and grid: `flex` alone is a display; the exact words come before `flex-1`.
    "flex-direction": [{ flex: ["row", "row-reverse", "col", "col-reverse"] }],
    "flex-wrap": [{ flex: ["wrap", "wrap-reverse", "nowrap"] }],
    flex: byWord("flex"),
    basis: byWord("basis"),
    shrink: ["shrink", ...byWord("shrink")],
    grow: ["grow", ...byWord("grow")],
    "grid-cols": byWord("grid-cols"),
    "col-span": byWord("col-span"),
    "col-start": byWord("col-start"),
    "row-start": byWord("row-start"),
    gap: byWord("gap"),
    "gap-x": byWord("gap-x"),
    "gap-y": byWord("gap-y"),
    "justify-content": byWord("justify"),
    "align-items": byWord("items"),
    "align-self": byWord("self"),
    "space-y": byWord("space-y"),
    "space-x": byWord("space-x"),
    "divide-y": ["divide-y", ...byWord("divide-y")],
    "divide-color": byWord("divide"),
    // Spacing: `p` covers every side, `px` left and right; the later one wins where they meet.
    p: byWord("p"),
    ...Object.fromEntries(SIDES.map((side) => [`p${side}`, byWord(`p${side}`)])),
    m: byWord("m"),
    ...Object.fromEntries(SIDES.map((side) => [`m${side}`, byWord(`m${side}`)])),
    "scroll-mt": byWord("scroll-mt"),
    // Sizing: `size` sets width and height.
    size: byWord("size"),
    w: byWord("w"),
    h: byWord("h"),
    "min-w": byWord("min-w"),
    "min-h": byWord("min-h"),
    "max-w": byWord("max-w"),
    "max-h": byWord("max-h"),
    aspect: byWord("aspect"),
    // Type: sizes and alignments by their words, any other `text-` is a colour.
    "font-size": [{ text: FONT_SIZES }],
    "text-alignment": [{ text: ["left", "center", "right", "justify", "start", "end"] }],
    "text-color": byWord("text"),
    "font-weight": [
      { font: ["thin", "extralight", "light", "normal", "medium", "semibold", "bold", "extrabold", "black"] },
    ],
    "font-family": [{ font: ["sans", "serif", "mono"] }],
    leading: byWord("leading"),
    tracking: byWord("tracking"),
    "text-transform": ["uppercase", "lowercase", "capitalize", "normal-case"],
    "text-decoration": ["underline", "overline", "line-through", "no-underline"],
    "decoration-thickness": byWord("decoration"),
    "underline-offset": byWord("underline-offset"),
    whitespace: byWord("whitespace"),
    "word-break": ["break-normal", "break-words", "break-all", "break-keep"],
    truncate: ["truncate"],
    "line-clamp": byWord("line-clamp"),
    "list-style-type": [{ list: ["none", "disc", "decimal"] }],
    "vertical-align": byWord("align"),
    // Borders: `border` and `border-2` are widths, `border-dashed` a style, anything else a colour.
    "border-w": [{ border: ["", isWidth] }],
    ...Object.fromEntries(SIDES.map((side) => [`border-w-${side}`, [{ [`border-${side}`]: ["", isWidth] }]])),
    "border-style": [{ border: ["solid", "dashed", "dotted", "double", "hidden", "none"] }],
    "border-collapse": [{ border: ["collapse", "separate"] }],
    "border-color": byWord("border"),
    rounded: ["rounded", ...byWord("rounded")],
    "ring-w": [{ ring: ["", isWidth] }],
    "ring-color": byWord("ring"),
    shadow: ["shadow", ...byWord("shadow")],
    outline: [{ outline: ["none", "hidden"] }],
    // Colours, effects, the rest.
    bg: byWord("bg"),
    accent: byWord("accent"),
    opacity: byWord("opacity"),
    brightness: byWord("brightness"),
    rotate: byWord("rotate"),
    transition: ["transition", ...byWord("transition")],
    animate: byWord("animate"),
    cursor: byWord("cursor"),
    resize: ["resize", ...byWord("resize")],
    "object-fit": [{ object: ["contain", "cover", "fill", "none", "scale-down"] }],
    "break-inside": byWord("break-inside"),
  },
  // As in tailwind-merge's table, for the groups above.
  conflictingClassGroups: {
    overflow: ["overflow-x", "overflow-y"],
    inset: ["inset-x", "top", "right", "bottom", "left"],
    "inset-x": ["right", "left"],
    flex: ["basis", "grow", "shrink"],
    gap: ["gap-x", "gap-y"],
    p: ["px", "py", "pt", "pr", "pb", "pl"],
    px: ["pr", "pl"],
    py: ["pt", "pb"],
    m: ["mx", "my", "mt", "mr", "mb", "ml"],
    mx: ["mr", "ml"],
    my: ["mt", "mb"],
    size: ["w", "h"],
    "line-clamp": ["display", "overflow"],
    // `sr-only` sets these itself, and Tailwind writes them after it: an earlier one would undo the hiding.
    "sr-only": [
      "not-sr-only",
      "position",
      "size",
      "w",
      "h",
      "p",
      "px",
      "py",
      "pt",
      "pr",
      "pb",
      "pl",
      "m",
      "mx",
      "my",
      "mt",
      "mr",
      "mb",
      "ml",
      "overflow",
      "overflow-x",
      "overflow-y",
      "whitespace",
    ],
    "not-sr-only": ["sr-only"],
    "border-w": ["border-w-t", "border-w-r", "border-w-b", "border-w-l", "border-w-x", "border-w-y"],
    "border-w-x": ["border-w-r", "border-w-l"],
    "border-w-y": ["border-w-t", "border-w-b"],
  },
  conflictingClassGroupModifiers: { "font-size": ["leading"] },
  orderSensitiveModifiers: [
    "*",
    "**",
    "after",
    "backdrop",
    "before",
    "details-content",
    "file",
    "first-letter",
    "first-line",
    "marker",
    "placeholder",
    "selection",
  ],
}));

/** Joins class names and lets later Tailwind classes win over earlier ones. */
export function cn(...inputs: ClassValue[]): string {
  return twMerge(clsx(inputs));
}

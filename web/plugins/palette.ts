/**
 * Cyclewright's own colour scales. Contrast of the pairs the preset uses
 * (text on background, WCAG 2.1 relative luminance):
 * ink.600 / white 8.7:1, graphite.500 / white 5.7:1, graphite.400 form borders / white 3.1:1,
 * ember.800 / ember.100 7.5:1, lagoon.800 / lagoon.100 7.9:1, white / ink.800 13.2:1.
 */

/** Deep ink blue: the primary colour. */
export const ink = {
  50: '#eef2f8', 100: '#d8e1ee', 200: '#b1c3dd', 300: '#86a0c8', 400: '#5a7cb0', 500: '#3a5e96',
  600: '#2b4b7e', 700: '#213c68', 800: '#1a3054', 900: '#132440', 950: '#0b172b',
};

/** Warm amber, reserved for catalysts. */
export const ember = {
  50: '#fff8eb', 100: '#fdecc8', 200: '#fad68c', 300: '#f6bb52', 400: '#eea12b', 500: '#d98613',
  600: '#b4690c', 700: '#8e500e', 800: '#6f3f11', 900: '#5b3412', 950: '#341b06',
};

/** Teal, reserved for intermediates. */
export const lagoon = {
  50: '#effbf9', 100: '#d2f3ee', 200: '#a5e6dd', 300: '#6fd1c5', 400: '#3cb5a8', 500: '#20998d',
  600: '#167a72', 700: '#15625c', 800: '#144f4b', 900: '#12413e', 950: '#062624',
};

/** Neutral greys with a faint cool cast: surfaces, borders and text. */
export const graphite = {
  0: '#ffffff', 50: '#f6f7f9', 100: '#eceef2', 200: '#dce0e6', 300: '#c4cad3', 400: '#8c94a0',
  500: '#5f6773', 600: '#4b525d', 700: '#3b424d', 800: '#2a3039', 900: '#1b1f26', 950: '#0f1216',
};

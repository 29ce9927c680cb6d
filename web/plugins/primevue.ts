import type { App } from 'vue';
import PrimeVue from 'primevue/config';
import ToastService from 'primevue/toastservice';
import Aura from '@primeuix/themes/aura';
import { definePreset } from '@primeuix/themes';
import { feedbackComponents } from './feedback-tokens';
import { ember, graphite, ink, lagoon } from './palette';

/**
 * Aura's component styles with our palette. `extend` adds the chemistry roles as
 * CSS variables (`--p-catalyst-color`, `--p-intermediate-background`, …) for later screens.
 */
export const CyclewrightPreset = definePreset(Aura, {
  primitive: { ink, ember, lagoon, graphite },
  semantic: {
    primary: ink,
    focusRing: { width: '2px', style: 'solid', color: '{primary.600}', offset: '2px' },
    // Aura gives a focused text field only a faint border colour; ours gets the buttons' 2 px ring,
    // on every field (inputs, selects, pickers), so the keyboard's place is plain to see.
    formField: { focusRing: { width: '2px', style: 'solid', color: '{primary.600}', offset: '1px', shadow: 'none' } },
    colorScheme: {
      light: {
        surface: graphite,
        primary: { color: '{primary.600}', contrastColor: '#ffffff', hoverColor: '{primary.700}', activeColor: '{primary.800}' },
        highlight: { background: '{primary.50}', focusBackground: '{primary.100}', color: '{primary.700}', focusColor: '{primary.800}' },
        formField: { borderColor: '{surface.400}', hoverBorderColor: '{surface.500}' },
        text: { color: '{surface.700}', hoverColor: '{surface.800}', mutedColor: '{surface.500}', hoverMutedColor: '{surface.600}' },
      },
    },
  },
  components: feedbackComponents,
  extend: {
    catalyst: { color: '{ember.800}', background: '{ember.100}', border: '{ember.500}' },
    intermediate: { color: '{lagoon.800}', background: '{lagoon.100}', border: '{lagoon.500}' },
    frame: { background: '{ink.800}', color: '#ffffff', mutedColor: '{ink.200}' },
  },
});

export function installPrimeVue(app: App): void {
  app.use(PrimeVue, {
    theme: { preset: CyclewrightPreset, options: { darkModeSelector: '.cw-dark', cssLayer: false } },
  });
  app.use(ToastService);
}

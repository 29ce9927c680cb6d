import { onBeforeUnmount, ref, shallowRef, watch, type Ref } from 'vue';
import type { Chart, ChartConfiguration } from 'chart.js';

type ChartClass = typeof Chart;
let loading: Promise<ChartClass> | null = null;

/** chart.js with only the parts the kinetics plots use, fetched on first use (not in the first screen). */
function loadChart(): Promise<ChartClass> {
  loading ??= import('chart.js').then((lib) => {
    lib.Chart.register(
      lib.LineController, lib.BarController, lib.LineElement, lib.BarElement, lib.PointElement,
      lib.LinearScale, lib.LogarithmicScale, lib.CategoryScale, lib.Legend, lib.Tooltip,
    );
    lib.Chart.defaults.font.family = '"Noto Sans", system-ui, sans-serif';
    return lib.Chart;
  });
  return loading;
}

/** A chart on `canvas`, rebuilt whenever `config` changes; `status` says whether chart.js has loaded. */
export function useChart(canvas: Ref<HTMLCanvasElement | null>, config: Ref<ChartConfiguration | null>) {
  const chart = shallowRef<Chart | null>(null);
  const status = ref<'loading' | 'ready' | 'error'>('loading');

  async function draw(): Promise<void> {
    const element = canvas.value;
    const next = config.value;
    if (!element || !next) return;
    const ChartClass = await loadChart();
    chart.value?.destroy();
    chart.value = new ChartClass(element, next);
    status.value = 'ready';
  }

  watch([canvas, config], () => void draw().catch(() => (status.value = 'error')), { immediate: true });
  onBeforeUnmount(() => chart.value?.destroy());
  return { chart, status };
}

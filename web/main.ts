import { createApp } from 'vue';
import { createPinia } from 'pinia';
import '@fontsource/noto-sans/400.css';
import '@fontsource/noto-sans/600.css';
import '@fontsource/noto-sans-mono/400.css';
import 'primeicons/primeicons.css';
import './styles/base.css';
import App from './App.vue';
import { installPrimeVue } from './plugins/primevue';
import { connectHttpToSession } from './plugins/http';
import { createAppRouter } from './router';

const app = createApp(App);
const pinia = createPinia();
const router = createAppRouter(pinia);

app.use(pinia);
app.use(router);
installPrimeVue(app);
connectHttpToSession(pinia, router);
app.mount('#app');

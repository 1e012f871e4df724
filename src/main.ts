import { createApp } from 'vue'
import { createPinia } from 'pinia'
import PrimeVue from 'primevue/config'
import ConfirmationService from 'primevue/confirmationservice'
import ToastService from 'primevue/toastservice'
import App from './App.vue'
import router from './router'
import { DARK_MODE_CLASS, FitwrightPreset } from './theme/preset'
import './assets/fonts'
import './assets/main.css'

const app = createApp(App)
app.use(createPinia())
app.use(router)
app.use(PrimeVue, { theme: { preset: FitwrightPreset, options: { darkModeSelector: `.${DARK_MODE_CLASS}` } } })
app.use(ToastService)
app.use(ConfirmationService)
app.mount('#app')

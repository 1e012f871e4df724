import { createRouter, createWebHistory, type RouteLocationNormalized } from 'vue-router'
import type { Permission } from '@shared/permissions'
import { setUnauthorizedHandler } from '@/api/http'
import { useSessionStore } from '@/stores/session'

declare module 'vue-router' {
  interface RouteMeta {
    /** Open without a session (the sign-in page). */
    public?: boolean
    permission?: Permission
    title?: string
  }
}

const router = createRouter({
  history: createWebHistory(import.meta.env.BASE_URL),
  routes: [
    { path: '/sign-in', name: 'sign-in', component: () => import('@/views/SignInView.vue'), meta: { public: true, title: 'Sign in' } },
    {
      path: '/forgot-password',
      name: 'forgot-password',
      component: () => import('@/views/ForgotPasswordView.vue'),
      meta: { public: true, title: 'Forgot password' },
    },
    {
      path: '/set-password',
      name: 'set-password',
      component: () => import('@/views/SetPasswordView.vue'),
      meta: { public: true, title: 'Choose a password' },
    },
    {
      path: '/shared',
      name: 'shared',
      component: () => import('@/views/SharedView.vue'),
      meta: { public: true, title: 'Shared with you' },
    },
    {
      path: '/',
      component: () => import('@/layouts/AppLayout.vue'),
      children: [
        { path: '', name: 'home', redirect: { name: 'lookup' } },
        {
          path: 'lookup',
          name: 'lookup',
          component: () => import('@/views/LookupView.vue'),
          meta: { permission: 'catalogue.read', title: 'Look up a part' },
        },
        {
          path: 'parts',
          name: 'parts',
          component: () => import('@/views/PartsCatalogueView.vue'),
          meta: { permission: 'catalogue.read', title: 'Parts catalogue' },
        },
        {
          path: 'parts/:partNumber',
          name: 'part',
          component: () => import('@/views/PartView.vue'),
          meta: { permission: 'catalogue.read', title: 'Part' },
        },
        {
          path: 'parts/:partNumber/substitutes',
          name: 'part-substitutes',
          component: () => import('@/views/SubstitutesView.vue'),
          meta: { permission: 'catalogue.read', title: 'Substitutes' },
        },
        {
          path: 'graph',
          name: 'graph-home',
          component: () => import('@/views/GraphView.vue'),
          meta: { permission: 'catalogue.read', title: 'Fit graph' },
        },
        {
          path: 'graph/path',
          name: 'graph-path',
          component: () => import('@/views/GraphView.vue'),
          meta: { permission: 'catalogue.read', title: 'Path between two parts' },
        },
        {
          path: 'graph/:partNumber',
          name: 'graph',
          component: () => import('@/views/GraphView.vue'),
          meta: { permission: 'catalogue.read', title: 'Fit graph' },
        },
        {
          path: 'planner',
          name: 'planner',
          component: () => import('@/views/PlannerView.vue'),
          meta: { permission: 'builds.evaluate', title: 'Build planner' },
        },
        {
          path: 'planner/:id(\\d+)',
          name: 'planner-sheet',
          component: () => import('@/views/PlannerView.vue'),
          meta: { permission: 'builds.save', title: 'Build sheet' },
        },
        {
          path: 'builds',
          name: 'builds',
          component: () => import('@/views/BuildSheetsView.vue'),
          meta: { permission: 'builds.save', title: 'Build sheets' },
        },
        {
          path: 'quotes',
          name: 'quotes',
          component: () => import('@/views/QuotesView.vue'),
          meta: { permission: 'builds.evaluate', title: 'Quotes' },
        },
        {
          path: 'quotes/:id(\\d+)',
          name: 'quote',
          component: () => import('@/views/QuoteView.vue'),
          meta: { permission: 'builds.evaluate', title: 'Quote' },
        },
        {
          path: 'review',
          name: 'review',
          component: () => import('@/views/ReviewView.vue'),
          meta: { permission: 'catalogue.edit', title: 'Review proposed links' },
        },
        {
          path: 'vehicles',
          name: 'vehicles',
          component: () => import('@/views/VehiclesView.vue'),
          meta: { permission: 'catalogue.read', title: 'Start from the vehicle' },
        },
        {
          path: 'vehicles/:id(\\d+)',
          name: 'vehicle',
          component: () => import('@/views/VehicleView.vue'),
          meta: { permission: 'catalogue.read', title: 'Vehicle' },
        },
        {
          path: 'stock',
          name: 'stock',
          component: () => import('@/views/StockView.vue'),
          meta: { permission: 'stock.manage', title: 'Stock' },
        },
        {
          path: 'stock/new',
          name: 'stock-new',
          component: () => import('@/views/StockUnitView.vue'),
          meta: { permission: 'stock.manage', title: 'Add a unit' },
        },
        {
          path: 'stock/:id(\\d+)',
          name: 'stock-unit',
          component: () => import('@/views/StockUnitView.vue'),
          meta: { permission: 'stock.manage', title: 'Stock unit' },
        },
        {
          path: 'field-reports',
          name: 'field-reports',
          component: () => import('@/views/FieldReportsView.vue'),
          meta: { permission: 'field-reports.file', title: 'Field reports' },
        },
        {
          path: 'field-reports/new',
          name: 'field-report-new',
          component: () => import('@/views/FieldReportNewView.vue'),
          meta: { permission: 'field-reports.file', title: 'Report a fit' },
        },
        {
          path: 'field-reports/:id(\\d+)',
          name: 'field-report',
          component: () => import('@/views/FieldReportView.vue'),
          meta: { permission: 'field-reports.file', title: 'Field report' },
        },
        {
          path: 'imports',
          name: 'imports',
          component: () => import('@/views/ImportsView.vue'),
          meta: { permission: 'imports.open', title: 'Imports and exports' },
        },
        {
          path: 'users',
          name: 'users',
          component: () => import('@/views/UsersView.vue'),
          meta: { permission: 'users.manage', title: 'Users and roles' },
        },
        {
          path: 'security-events',
          name: 'security-events',
          component: () => import('@/views/SecurityEventsView.vue'),
          meta: { permission: 'users.manage', title: 'Security events' },
        },
        {
          path: 'account',
          name: 'account',
          component: () => import('@/views/AccountView.vue'),
          meta: { title: 'Your account' },
        },
        {
          path: 'mail',
          name: 'mail',
          component: () => import('@/views/MailView.vue'),
          meta: { permission: 'users.manage', title: 'Mail' },
        },
        {
          path: 'settings/shop',
          name: 'shop-settings',
          component: () => import('@/views/ShopSettingsView.vue'),
          meta: { permission: 'users.manage', title: 'Shop settings' },
        },
        {
          path: 'forbidden',
          name: 'forbidden',
          component: () => import('@/views/ForbiddenView.vue'),
          meta: { title: 'Not for your role' },
        },
        {
          path: ':pathMatch(.*)*',
          name: 'not-found',
          component: () => import('@/views/NotFoundView.vue'),
          meta: { title: 'Not found' },
        },
      ],
    },
  ],
})

function signInRoute(to: RouteLocationNormalized) {
  return { name: 'sign-in', query: to.fullPath !== '/' ? { redirect: to.fullPath } : {} }
}

router.beforeEach(async (to) => {
  const session = useSessionStore()
  // After a failed check the sign-in page shows why; asking again on the way there would only repeat it.
  if (!(to.meta.public && session.connectionError)) await session.restore()
  if (to.meta.public) return session.isSignedIn && to.name === 'sign-in' ? { name: 'home' } : true
  if (!session.isSignedIn) return signInRoute(to)
  if (to.meta.permission && !session.allows(to.meta.permission)) return { name: 'forbidden' }
  return true
})

router.afterEach((to) => {
  document.title = to.meta.title ? `${to.meta.title} · Fitwright` : 'Fitwright'
})

setUnauthorizedHandler(() => {
  useSessionStore().expire()
  const current = router.currentRoute.value
  if (!current.meta.public) void router.push(signInRoute(current))
})

export default router

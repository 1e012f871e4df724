import { definePreset } from '@primeuix/themes'
import Aura from '@primeuix/themes/aura'

/*
 * Fitwright's own look: a deep verdigris primary (oxidised copper), warm
 * cast-iron greys for surfaces, square-ish corners and a denser rhythm for
 * all-day counter work.
 */
export const FitwrightPreset = definePreset(Aura, {
  primitive: {
    borderRadius: { none: '0', xs: '2px', sm: '3px', md: '4px', lg: '6px', xl: '10px' },
    verdigris: {
      50: '#eef7f6',
      100: '#d3ebe8',
      200: '#a8d6d1',
      300: '#75bbb4',
      400: '#479c95',
      500: '#2d807a',
      600: '#226762',
      700: '#1f5450',
      800: '#1c4542',
      900: '#1a3a38',
      950: '#0c2220',
    },
    castiron: {
      0: '#ffffff',
      50: '#f7f6f4',
      100: '#ecebe7',
      200: '#d9d7d1',
      300: '#bcb9b1',
      400: '#9a968d',
      500: '#7c786f',
      600: '#635f58',
      700: '#4d4a45',
      800: '#35332f',
      900: '#242320',
      950: '#171614',
    },
  },
  semantic: {
    primary: {
      50: '{verdigris.50}',
      100: '{verdigris.100}',
      200: '{verdigris.200}',
      300: '{verdigris.300}',
      400: '{verdigris.400}',
      500: '{verdigris.500}',
      600: '{verdigris.600}',
      700: '{verdigris.700}',
      800: '{verdigris.800}',
      900: '{verdigris.900}',
      950: '{verdigris.950}',
    },
    colorScheme: {
      light: {
        primary: { color: '{verdigris.700}', contrastColor: '#ffffff', hoverColor: '{verdigris.800}', activeColor: '{verdigris.900}' },
        surface: {
          0: '{castiron.0}',
          50: '{castiron.50}',
          100: '{castiron.100}',
          200: '{castiron.200}',
          300: '{castiron.300}',
          400: '{castiron.400}',
          500: '{castiron.500}',
          600: '{castiron.600}',
          700: '{castiron.700}',
          800: '{castiron.800}',
          900: '{castiron.900}',
          950: '{castiron.950}',
        },
      },
      dark: {
        primary: {
          color: '{verdigris.300}',
          contrastColor: '{verdigris.950}',
          hoverColor: '{verdigris.200}',
          activeColor: '{verdigris.100}',
        },
        surface: {
          0: '#ffffff',
          50: '{castiron.50}',
          100: '{castiron.100}',
          200: '{castiron.200}',
          300: '{castiron.300}',
          400: '{castiron.400}',
          500: '{castiron.500}',
          600: '{castiron.600}',
          700: '{castiron.700}',
          800: '{castiron.800}',
          900: '{castiron.900}',
          950: '{castiron.950}',
        },
      },
    },
  },
})

/** The class on <html> that switches PrimeVue and our own styles to the dark scheme. */
export const DARK_MODE_CLASS = 'fw-dark'

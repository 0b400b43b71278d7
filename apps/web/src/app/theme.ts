import { createTheme, type CSSVariablesResolver, type MantineColorsTuple } from '@mantine/core';
import inputs from './inputs.module.css';
import numberInput from './number-input.module.css';

/** BenchProof's own colours: a deep workshop teal and a brass accent. */
const bench: MantineColorsTuple = ['#e8f4f3', '#cfe6e4', '#a2cdc9', '#72b3ad', '#4b9c95', '#338b84', '#25807a', '#1f5f5b', '#174a47', '#0d3331'];
const brass: MantineColorsTuple = ['#fdf6e4', '#f8ebc7', '#f1d68f', '#eac158', '#e4af2f', '#e0a526', '#c98f17', '#a87510', '#875d0b', '#644406'];

const TAP_LABEL = { minHeight: 44, display: 'flex', alignItems: 'center' } as const;

type PageControl = 'first' | 'previous' | 'last' | 'next';
const PAGE_CONTROLS: Record<PageControl, string> = { first: 'First page', previous: 'Previous page', next: 'Next page', last: 'Last page' };

export const theme = createTheme({
  primaryColor: 'bench',
  primaryShade: { light: 7, dark: 5 },
  colors: { bench, brass },
  fontFamily: 'Inter, system-ui, sans-serif',
  headings: { fontFamily: 'Inter, system-ui, sans-serif', fontWeight: '700' },
  defaultRadius: 'md',
  cursorType: 'pointer',
  components: {
    // Fields of the default size are 44 px high (inputs.module.css).
    Input: { classNames: { wrapper: inputs.wrapper } },
    Button: { defaultProps: { size: 'md' } },
    TextInput: { defaultProps: { size: 'md' } },
    // The show/hide button is a 44 px target inside a 50 px field.
    PasswordInput: {
      defaultProps: { size: 'lg', rightSectionWidth: 52 },
      styles: { visibilityToggle: { width: 44, height: 44, minWidth: 44, minHeight: 44 } },
    },
    Select: { defaultProps: { size: 'md' } },
    // Steppers: up and down side by side, each a 44 px target in a 50 px field (number-input.module.css).
    NumberInput: { defaultProps: { size: 'lg', rightSectionWidth: 90 }, classNames: { controls: numberInput.controls, control: numberInput.control } },
    Textarea: { defaultProps: { size: 'md' } },
    // Phone at the workstand: every close button is a 44 px target with a spoken name (CloseButton xl = 44 px).
    CloseButton: { defaultProps: { size: 'xl', 'aria-label': 'Close' } },
    Modal: { defaultProps: { closeButtonProps: { size: 'xl', 'aria-label': 'Close' } } },
    Drawer: { defaultProps: { closeButtonProps: { size: 'xl', 'aria-label': 'Close' } } },
    // The navigation button's box is 44 px square whatever the size of its lines.
    Burger: { styles: { root: { minWidth: 44, minHeight: 44 } } },
    // Page buttons: 44 px (xl) with names a screen reader can say.
    Pagination: {
      defaultProps: {
        size: 'xl',
        getItemProps: (page: number) => ({ 'aria-label': `Page ${page}` }),
        getControlProps: (control: PageControl) => ({ 'aria-label': PAGE_CONTROLS[control] }),
      },
    },
    // A checkbox or switch is tapped through its label: the label line is 44 px high.
    Checkbox: { styles: { label: TAP_LABEL } },
    Switch: { styles: { label: TAP_LABEL } },
    // Each segment (Before / During / After, roles, units) is a 44 px high target.
    SegmentedControl: { styles: { label: { ...TAP_LABEL, justifyContent: 'center' } } },
    // Slider thumbs big enough for a thumb.
    Slider: { defaultProps: { thumbSize: 44 } },
  },
});

/**
 * Text of "light" badges, alerts and buttons (Mantine: shade 9 on shade 1) for the colours where that stays under
 * 4.5:1 (WCAG 1.4.3) — teal 4.3, green 3.8, lime 3.3, yellow 2.7, orange 3.6, red 4.5 — deepened to 70 % of
 * shade 9: 5.0 to 7.5:1 on shade 1 and at least 4.7:1 on the hover shade 2 (ratios by the WCAG 2 formula).
 */
const LIGHT_TEXT: Record<string, string> = {
  teal: '#065940',
  green: '#1e612b',
  lime: '#406809',
  yellow: '#a15300',
  orange: '#98320b',
  red: '#8d1d1d',
};

/** Dimmed text one shade darker than Mantine's default, so it keeps a 4.5:1 contrast on white (WCAG 1.4.3). */
export const cssVariablesResolver: CSSVariablesResolver = () => ({
  variables: {},
  light: {
    '--mantine-color-dimmed': 'var(--mantine-color-gray-7)',
    ...Object.fromEntries(Object.entries(LIGHT_TEXT).map(([c, hex]) => [`--mantine-color-${c}-light-color`, hex])),
  },
  dark: {},
});

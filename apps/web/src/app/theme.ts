import { createTheme, type MantineColorsTuple } from '@mantine/core';

/** BenchProof's own colours: a deep workshop teal and a brass accent. */
const bench: MantineColorsTuple = ['#e8f4f3', '#cfe6e4', '#a2cdc9', '#72b3ad', '#4b9c95', '#338b84', '#25807a', '#1f5f5b', '#174a47', '#0d3331'];
const brass: MantineColorsTuple = ['#fdf6e4', '#f8ebc7', '#f1d68f', '#eac158', '#e4af2f', '#e0a526', '#c98f17', '#a87510', '#875d0b', '#644406'];

export const theme = createTheme({
  primaryColor: 'bench',
  primaryShade: { light: 7, dark: 5 },
  colors: { bench, brass },
  fontFamily: 'Inter, system-ui, sans-serif',
  headings: { fontFamily: 'Inter, system-ui, sans-serif', fontWeight: '700' },
  defaultRadius: 'md',
  cursorType: 'pointer',
  components: {
    Button: { defaultProps: { size: 'md' } },
    TextInput: { defaultProps: { size: 'md' } },
    PasswordInput: { defaultProps: { size: 'md' } },
    Select: { defaultProps: { size: 'md' } },
    NumberInput: { defaultProps: { size: 'md' } },
    Textarea: { defaultProps: { size: 'md' } },
  },
});

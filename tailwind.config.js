/**
 * Throwline's own palette and type scale. Calm neutrals for long desk sessions, one deep teal for
 * actions, and three verdict colours that stay distinguishable in daylight on a warehouse phone.
 * Text colours keep at least 4.5:1 against paper, raised and sunk paper, and their verdict backgrounds (WCAG AA).
 * @type {import('tailwindcss').Config}
 */
export default {
	content: ['./src/**/*.{html,js,svelte,ts}'],
	theme: {
		extend: {
			colors: {
				ink: { DEFAULT: '#1b2a33', soft: '#42535e', faint: '#5c6b74' },
				paper: { DEFAULT: '#f6f4ef', raised: '#ffffff', sunk: '#ece8df' },
				line: { DEFAULT: '#d9d3c7', strong: '#b9b1a2' },
				river: { DEFAULT: '#1f5c63', dark: '#163f44', light: '#d7e8e6' },
				clear: { DEFAULT: '#2b7247', bg: '#e1f0e6' },
				tight: { DEFAULT: '#8c5c0d', bg: '#f8ecd2' },
				short: { DEFAULT: '#a63a2c', bg: '#f6e0dc' }
			},
			fontFamily: {
				sans: ['"Work Sans"', 'system-ui', 'sans-serif'],
				mono: ['ui-monospace', 'SFMono-Regular', 'Menlo', 'monospace']
			},
			fontSize: {
				xs: ['0.75rem', { lineHeight: '1.1rem' }],
				sm: ['0.875rem', { lineHeight: '1.3rem' }],
				base: ['1rem', { lineHeight: '1.55rem' }],
				lg: ['1.175rem', { lineHeight: '1.7rem' }],
				xl: ['1.4rem', { lineHeight: '1.9rem' }],
				'2xl': ['1.75rem', { lineHeight: '2.2rem' }],
				'3xl': ['2.2rem', { lineHeight: '2.6rem' }]
			},
			borderRadius: { card: '0.6rem' },
			boxShadow: { card: '0 1px 2px rgb(27 42 51 / 0.06), 0 2px 8px rgb(27 42 51 / 0.05)' }
		}
	}
};

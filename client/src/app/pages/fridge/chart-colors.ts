// Reads our theme's colours for the canvas, which cannot resolve CSS variables itself.

export interface ChartColors {
  line: string;
  backup: string;
  band: string;
  excursion: string;
  text: string;
  grid: string;
}

function resolve(variable: string, fallback: string): string {
  const probe = document.createElement('span');
  probe.style.color = `var(${variable}, ${fallback})`;
  probe.style.display = 'none';
  document.body.appendChild(probe);
  const color = getComputedStyle(probe).color || fallback;
  probe.remove();
  return color;
}

/** The same colour with an alpha, from the rgb() form browsers report. */
function withAlpha(rgb: string, alpha: number): string {
  const m = /rgba?\((\d+),\s*(\d+),\s*(\d+)/.exec(rgb);
  return m ? `rgba(${m[1]}, ${m[2]}, ${m[3]}, ${alpha})` : rgb;
}

export function chartColors(): ChartColors {
  return {
    line: resolve('--mat-sys-primary', '#006972'),
    backup: resolve('--mat-sys-tertiary', '#8a4b12'),
    band: withAlpha(resolve('--vy-on-ok-container', '#0f3d22'), 0.1),
    excursion: withAlpha(resolve('--mat-sys-error', '#ba1a1a'), 0.16),
    text: resolve('--mat-sys-on-surface-variant', '#3e494a'),
    grid: withAlpha(resolve('--mat-sys-outline-variant', '#bdc9ca'), 0.6),
  };
}

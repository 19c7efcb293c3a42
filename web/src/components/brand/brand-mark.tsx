import SvgIcon, { type SvgIconProps } from '@mui/material/SvgIcon';

/** Peakwise's glyph (same drawing as public/favicon.svg): a starter jar risen to its band. */
export function BrandMark(props: SvgIconProps) {
  return (
    <SvgIcon viewBox="0 0 64 64" {...props}>
      <rect x="19" y="6" width="26" height="8" rx="2.5" fill="#2F4858" />
      <rect x="13" y="14" width="38" height="44" rx="9" fill="#FBF7F0" stroke="#2F4858" strokeWidth="4" />
      <path d="M17 38 C22 26 42 26 47 38 V49 a5 5 0 0 1 -5 5 H22 a5 5 0 0 1 -5 -5 Z" fill="#C9832E" />
      <path d="M13 28 H51" stroke="#2F4858" strokeWidth="3" strokeDasharray="4 3" />
    </SvgIcon>
  );
}

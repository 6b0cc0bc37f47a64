/** Every client URL in one place: `paths.home.href()`. */
export const paths = {
  home: { path: '/', href: () => '/' },
} as const;

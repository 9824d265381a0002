/**
 * Standard sizes commonly fitted to passenger cars, SUVs and light trucks in North America
 * (common practice; the list is ours, chosen from sizes in wide use). Each gets a Size sheet in the sitemap.
 */
export const COMMON_SIZES = [
  "175/65R14", "185/65R15", "195/65R15", "205/55R16", "205/60R16", "215/55R17", "215/60R16", "215/65R16",
  "215/45R17", "225/45R17", "225/50R17", "225/55R17", "225/60R17", "225/65R17", "235/40R18", "235/45R18",
  "235/55R18", "235/60R18", "235/65R17", "235/65R18", "245/40R18", "245/45R19", "245/60R18", "245/75R16",
  "255/55R18", "255/65R17", "265/60R18", "265/65R17", "265/70R16", "265/70R17", "275/40R20", "275/55R20",
  "275/60R20", "275/65R18", "285/45R22", "285/50R20", "285/70R17", "305/45R22", "LT245/75R16", "LT265/70R17",
  "LT265/75R16", "LT275/70R18", "LT285/75R16", "LT285/70R17", "215/65R16C", "235/65R16C", "31x10.50R15LT",
  "33x12.50R15LT", "35x12.50R17LT", "35x12.50R20LT",
] as const;

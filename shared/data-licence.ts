/** The licence every contributed measurement is published under; contributors accept it once. */
export const DATA_LICENCE = {
  id: 'CC-BY-4.0',
  name: 'Creative Commons Attribution 4.0 International',
  url: 'https://creativecommons.org/licenses/by/4.0/',
  attribution: 'Scanwright contributors',
} as const;

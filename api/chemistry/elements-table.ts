/**
 * The 118 elements: symbol, atomic number, English name (IUPAC spelling) and atomic weight.
 *
 * Weights follow the IUPAC standard atomic weights (CIAAW 2021, Prohaska et al., Pure Appl. Chem.
 * 94 (2022) 573), written from memory; the revisions named in the abstracts of the CIAAW 2013
 * and 2021 reports (Ar, Cd, Hf, Ir, Mo, Pb, Se, Th, Yb) were checked against them. Elements whose
 * standard weight is an interval (H, Li, B, C, N, O, Mg, Si, S, Cl, Ar, Br, Tl, Pb) carry IUPAC's
 * conventional value. Elements without a
 * standard atomic weight carry the mass number of their longest-lived isotope (IUPAC periodic
 * table, shown there in brackets), marked `M`.
 */
export const ELEMENT_ROWS: readonly (readonly [string, string, number, 'M'?])[] = [
  ['H', 'Hydrogen', 1.008], ['He', 'Helium', 4.002602], ['Li', 'Lithium', 6.94],
  ['Be', 'Beryllium', 9.0121831], ['B', 'Boron', 10.81], ['C', 'Carbon', 12.011],
  ['N', 'Nitrogen', 14.007], ['O', 'Oxygen', 15.999], ['F', 'Fluorine', 18.998403162],
  ['Ne', 'Neon', 20.1797], ['Na', 'Sodium', 22.98976928], ['Mg', 'Magnesium', 24.305],
  ['Al', 'Aluminium', 26.9815384], ['Si', 'Silicon', 28.085], ['P', 'Phosphorus', 30.973761998],
  ['S', 'Sulfur', 32.06], ['Cl', 'Chlorine', 35.45], ['Ar', 'Argon', 39.95],
  ['K', 'Potassium', 39.0983], ['Ca', 'Calcium', 40.078], ['Sc', 'Scandium', 44.955907],
  ['Ti', 'Titanium', 47.867], ['V', 'Vanadium', 50.9415], ['Cr', 'Chromium', 51.9961],
  ['Mn', 'Manganese', 54.938043], ['Fe', 'Iron', 55.845], ['Co', 'Cobalt', 58.933194],
  ['Ni', 'Nickel', 58.6934], ['Cu', 'Copper', 63.546], ['Zn', 'Zinc', 65.38],
  ['Ga', 'Gallium', 69.723], ['Ge', 'Germanium', 72.63], ['As', 'Arsenic', 74.921595],
  ['Se', 'Selenium', 78.971], ['Br', 'Bromine', 79.904], ['Kr', 'Krypton', 83.798],
  ['Rb', 'Rubidium', 85.4678], ['Sr', 'Strontium', 87.62], ['Y', 'Yttrium', 88.905838],
  ['Zr', 'Zirconium', 91.222], ['Nb', 'Niobium', 92.90637], ['Mo', 'Molybdenum', 95.95],
  ['Tc', 'Technetium', 97, 'M'], ['Ru', 'Ruthenium', 101.07], ['Rh', 'Rhodium', 102.90549],
  ['Pd', 'Palladium', 106.42], ['Ag', 'Silver', 107.8682], ['Cd', 'Cadmium', 112.414],
  ['In', 'Indium', 114.818], ['Sn', 'Tin', 118.71], ['Sb', 'Antimony', 121.76],
  ['Te', 'Tellurium', 127.6], ['I', 'Iodine', 126.90447], ['Xe', 'Xenon', 131.293],
  ['Cs', 'Caesium', 132.90545196], ['Ba', 'Barium', 137.327], ['La', 'Lanthanum', 138.90547],
  ['Ce', 'Cerium', 140.116], ['Pr', 'Praseodymium', 140.90766], ['Nd', 'Neodymium', 144.242],
  ['Pm', 'Promethium', 145, 'M'], ['Sm', 'Samarium', 150.36], ['Eu', 'Europium', 151.964],
  ['Gd', 'Gadolinium', 157.249], ['Tb', 'Terbium', 158.925354], ['Dy', 'Dysprosium', 162.5],
  ['Ho', 'Holmium', 164.930329], ['Er', 'Erbium', 167.259], ['Tm', 'Thulium', 168.934219],
  ['Yb', 'Ytterbium', 173.045], ['Lu', 'Lutetium', 174.9668], ['Hf', 'Hafnium', 178.486],
  ['Ta', 'Tantalum', 180.94788], ['W', 'Tungsten', 183.84], ['Re', 'Rhenium', 186.207],
  ['Os', 'Osmium', 190.23], ['Ir', 'Iridium', 192.217], ['Pt', 'Platinum', 195.084],
  ['Au', 'Gold', 196.96657], ['Hg', 'Mercury', 200.592], ['Tl', 'Thallium', 204.38],
  ['Pb', 'Lead', 207.2], ['Bi', 'Bismuth', 208.9804], ['Po', 'Polonium', 209, 'M'],
  ['At', 'Astatine', 210, 'M'], ['Rn', 'Radon', 222, 'M'], ['Fr', 'Francium', 223, 'M'],
  ['Ra', 'Radium', 226, 'M'], ['Ac', 'Actinium', 227, 'M'], ['Th', 'Thorium', 232.0377],
  ['Pa', 'Protactinium', 231.03588], ['U', 'Uranium', 238.02891], ['Np', 'Neptunium', 237, 'M'],
  ['Pu', 'Plutonium', 244, 'M'], ['Am', 'Americium', 243, 'M'], ['Cm', 'Curium', 247, 'M'],
  ['Bk', 'Berkelium', 247, 'M'], ['Cf', 'Californium', 251, 'M'], ['Es', 'Einsteinium', 252, 'M'],
  ['Fm', 'Fermium', 257, 'M'], ['Md', 'Mendelevium', 258, 'M'], ['No', 'Nobelium', 259, 'M'],
  ['Lr', 'Lawrencium', 262, 'M'], ['Rf', 'Rutherfordium', 267, 'M'], ['Db', 'Dubnium', 268, 'M'],
  ['Sg', 'Seaborgium', 269, 'M'], ['Bh', 'Bohrium', 270, 'M'], ['Hs', 'Hassium', 269, 'M'],
  ['Mt', 'Meitnerium', 278, 'M'], ['Ds', 'Darmstadtium', 281, 'M'], ['Rg', 'Roentgenium', 282, 'M'],
  ['Cn', 'Copernicium', 285, 'M'], ['Nh', 'Nihonium', 286, 'M'], ['Fl', 'Flerovium', 289, 'M'],
  ['Mc', 'Moscovium', 290, 'M'], ['Lv', 'Livermorium', 293, 'M'], ['Ts', 'Tennessine', 294, 'M'],
  ['Og', 'Oganesson', 294, 'M'],
];

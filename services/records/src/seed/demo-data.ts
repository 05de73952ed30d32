/**
 * An invented scenario for the demo only: the shop, its people, its tubs, animals and customers
 * are made up. Nothing here is a check value for any test of the calculations.
 */
export const DEMO_PASSWORD = 'tubwright-demo';

export const DEMO_SHOP = {
  name: 'Alder Bend Rack Works',
  town: 'Millbrook Falls',
  email: 'shop@demo.tubwright.test',
};

export const DEMO_USERS = [
  { email: 'owner@demo.tubwright.test', name: 'Rowan Ashby', role: 'owner' },
  { email: 'builder@demo.tubwright.test', name: 'Tamsin Hale', role: 'builder' },
  { email: 'keeper@demo.tubwright.test', name: 'Idris Calloway', role: 'keeper' },
  { email: 'sales@demo.tubwright.test', name: 'Maren Stoll', role: 'sales' },
] as const;

// Invented makers and model names; outer sizes in inches (length front to back, height with rim).
export const DEMO_TUB_MODELS = [
  { name: 'Nestbox 6', maker: 'Quillby Moulding', lengthIn: 16.5, widthIn: 11.75, heightIn: 4.25, volumeQt: 6, notes: 'Hatchling size.' },
  { name: 'Nestbox 15', maker: 'Quillby Moulding', lengthIn: 20.25, widthIn: 13.5, heightIn: 5.125, volumeQt: 15, notes: 'Juveniles and small adults.' },
  { name: 'Longhold 28', maker: 'Quillby Moulding', lengthIn: 23, widthIn: 16.25, heightIn: 6.5, volumeQt: 28, notes: 'The shop\'s most built rack.' },
  { name: 'Longhold 41', maker: 'Quillby Moulding', lengthIn: 34.5, widthIn: 16.5, heightIn: 6.25, volumeQt: 41, notes: 'Adult females; long rack.' },
  { name: 'Deepwell 32', maker: 'Farrow & Pike Plastics', lengthIn: 23.5, widthIn: 17, heightIn: 7.75, volumeQt: 32, notes: 'Taller sides for climbers.' },
  { name: 'Deepwell 56', maker: 'Farrow & Pike Plastics', lengthIn: 34.75, widthIn: 18.5, heightIn: 8.5, volumeQt: 56, notes: 'Large adults.' },
  { name: 'Slimline 12', maker: 'Farrow & Pike Plastics', lengthIn: 19.75, widthIn: 12.25, heightIn: 3.875, volumeQt: 12, notes: 'Low profile; use a small lid gap.' },
  { name: 'Vault 70', maker: 'Hollin Containers', lengthIn: 39.5, widthIn: 20, heightIn: 9.25, volumeQt: 70, notes: 'Biggest tub the shop racks.' },
] as const;

const FIRST_NAMES = ['Juniper', 'Basil', 'Clementine', 'Pickle', 'Saffron', 'Ember', 'Olive', 'Marlow', 'Nutmeg', 'Wren', 'Biscuit', 'Fennel', 'Hazel', 'Tansy', 'Quince', 'Sorrel', 'Bramble', 'Pippin', 'Tallow', 'Rook'];
const SPECIES = [
  { name: 'Python regius', prefix: 'PR', morphs: ['normal', 'pastel', 'het albino', 'albino', 'spider', 'pastel het clown', 'clown', 'mojave', 'enchi het piebald', 'piebald'], adultG: [1200, 2200] },
  { name: 'Morelia spilota', prefix: 'MS', morphs: ['normal', 'jaguar', 'het axanthic', 'zebra'], adultG: [2500, 5000] },
  { name: 'Antaresia childreni', prefix: 'AC', morphs: ['normal', 'het albino'], adultG: [350, 600] },
] as const;

/** About 40 animals, spread over species, sexes, ages and racks; deterministic so the demo looks the same each time. */
export function demoAnimals(today = new Date('2026-12-01T00:00:00Z')) {
  const animals = [];
  let n = 0;
  for (let i = 0; i < 40; i++) {
    const species = SPECIES[i < 28 ? 0 : i < 35 ? 1 : 2];
    n++;
    const ageDays = 60 + ((i * 97) % 2400);
    const hatch = new Date(today.getTime() - ageDays * 86400_000).toISOString().slice(0, 10);
    const [minG, maxG] = species.adultG;
    const grown = Math.min(1, ageDays / 1100);
    const weightG = Math.round(60 + grown * (minG + ((i * 53) % (maxG - minG))));
    const sex = i % 3 === 0 ? 'male' : i % 3 === 1 ? 'female' : ageDays < 200 ? 'unknown' : 'male';
    const status = i === 7 ? 'sold' : i === 19 ? 'on-hold' : i === 31 ? 'deceased' : 'active';
    animals.push({
      code: `${species.prefix}-${String(n).padStart(3, '0')}`,
      name: FIRST_NAMES[i % FIRST_NAMES.length]! + (i >= FIRST_NAMES.length ? ' II' : ''),
      species: species.name,
      morph: species.morphs[i % species.morphs.length]!,
      sex,
      hatchDate: hatch,
      weightG,
      status,
      location: status === 'active' || status === 'on-hold' ? `R${1 + Math.floor(i / 15)}-${1 + (Math.floor(i / 3) % 5)}${'ABC'[i % 3]}` : '',
      notes: '',
    });
  }
  return animals;
}

export const DEMO_CUSTOMERS = [
  { name: 'Priya Venkataraman', email: 'priya.v@example.test', phone: '555-0141', city: 'Harlow Creek', region: 'OH', address: '212 Birchwood Row, Harlow Creek, OH', source: 'website-widget' },
  { name: 'Declan Whitcombe', email: 'declan@example.test', phone: '555-0177', city: 'Stonebridge', region: 'PA', source: 'phone-or-email' },
  { name: 'Scaled Acres Breeding (Lena Ortiz)', email: 'lena@scaled-acres.example.test', phone: '555-0102', city: 'Red Hollow', region: 'TX', address: '9 Mesquite Spur, Red Hollow, TX', source: 'partner-api' },
  { name: 'Marcus Feld', email: 'mfeld@example.test', phone: '555-0158', city: 'Lake Orrin', region: 'MN', source: 'event' },
  { name: 'Hollow Log Exotics (Ada Brennan)', email: 'ada@hollowlog.example.test', phone: '555-0119', city: 'Pine Ford', region: 'GA', address: '48 Tanner Mill Rd, Pine Ford, GA', source: 'referral' },
  { name: 'Tobias Engstrom', email: 'tobias.e@example.test', phone: '555-0163', city: 'Westmere', region: 'WA' },
  { name: 'Keisha Dunmore', email: 'keisha.d@example.test', phone: '555-0125', city: 'Fallowfield', region: 'NC' },
  { name: 'Coil & Clutch Reptiles (Sam Ridley)', email: 'sam@coilclutch.example.test', phone: '555-0190', city: 'Brookvale', region: 'FL' },
  { name: 'Yusuf Adebayo', email: 'yusuf.a@example.test', phone: '555-0136', city: 'Carrow Point', region: 'IL' },
  { name: 'Greta Lindqvist', email: 'greta.l@example.test', phone: '555-0184', city: 'Ashgrove', region: 'CO' },
  { name: 'Noah Castellanos', email: 'noah.c@example.test', phone: '555-0112', city: 'Millbrook Falls', region: 'OH', notes: 'Picks up at the shop.' },
] as const;

// Minimal typings for the reference libraries the domain tests compare against (neither ships its own).

declare module 'js-quantities' {
  interface Quantity {
    scalar: number;
    to(unit: string): Quantity;
    kind(): string;
  }
  function Qty(value: number, unit: string): Quantity;
  export default Qty;
}

declare module 'convert-units' {
  interface Conversion {
    from(unit: string): { to(unit: string): number };
  }
  function convert(value: number): Conversion;
  export default convert;
}


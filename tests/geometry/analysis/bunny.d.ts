/** Types for the `bunny` package (the Stanford bunny as plain arrays); it ships none. */
declare module "bunny" {
  const bunny: { positions: [number, number, number][]; cells: [number, number, number][] };
  export default bunny;
}

/** The demo CSV, bundled as text by the build (an asset/source rule for addin/demo/data/*.csv). */
declare module '*.csv' {
  const text: string;
  export default text;
}

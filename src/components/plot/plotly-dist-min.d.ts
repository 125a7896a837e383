declare module 'plotly.js-dist-min' {
  const Plotly: object;
  export default Plotly;
}

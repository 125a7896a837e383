import Plotly from 'plotly.js-dist-min';
import createPlotlyComponent from 'react-plotly.js/factory';

/**
 * The plotting library bound to React. This module is only ever imported through React.lazy
 * (see plot.tsx), so the plotting bundle downloads on the pages that draw a plot and nowhere else.
 */
const PlotlyFigure = createPlotlyComponent(Plotly);
export default PlotlyFigure;

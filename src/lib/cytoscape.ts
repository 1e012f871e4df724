import cytoscape from 'cytoscape'
import fcose from 'cytoscape-fcose'

// Registered once per page load: cytoscape warns when an extension is registered twice.
cytoscape.use(fcose)

export { cytoscape }
export type { Core, LayoutOptions, NodeSingular } from 'cytoscape'

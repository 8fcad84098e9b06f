/**
 * The one-dimensional non-uniform mesh the solvers discretise on. A
 * {@link org.wurtzkit.solvers.mesh.Mesh} is an immutable, strictly increasing array of node depths
 * in metres from the surface, with a node on every interface, the surface, the bottom and every
 * delta sheet; {@link org.wurtzkit.solvers.mesh.MeshPolicy} says how fine it is (spacing at those
 * points, largest spacing, growth ratio away from them). Fine spacing where fields and wavefunctions
 * change fast and coarse spacing in thick buffers keep the node count, and so the O(N) cost of
 * every solve on the mesh, small.
 */
package org.wurtzkit.solvers.mesh;

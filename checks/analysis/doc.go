// Package analysis solves plane (2D) frames and trusses by the direct-stiffness method:
// displacements, reactions, member end forces, exact internal force diagrams and deflections,
// linear elastic buckling load factors, tension-only bracing, and builders for portal frames,
// purlin and girt lines and bracing bays.
//
// # Units
//
// N and mm throughout: lengths and coordinates in mm, E in MPa (N/mm²), A in mm², I in mm⁴,
// forces in N, moments in N·mm, distributed loads in N/mm (1 N/mm = 1 kN/m), mass per metre in
// kg/m (self weight = mass · 9.80665e-3 N/mm). Displacements are in mm, rotations in radians.
//
// # Sign conventions
//
// Global axes: X to the right, Y up; rotations and moments counter-clockwise positive. Nodal
// loads, reactions and displacements are global. A member's local x axis runs from its Start
// node to its End node and local y is local x turned 90° counter-clockwise. Member end forces
// are the forces the nodes exert on the member, in local axes: [N1 V1 M1 N2 V2 M2].
//
// Internal forces along a member at distance x from Start: axial N positive in tension; shear
// V = V1 + (local y load over [0, x]), so dM/dx = V; bending moment M positive when it puts
// the local −y face in tension ("sagging" with local y up). The portal builder orients its
// members so that local y points out of the frame, making positive M tension on the inside
// face, as in the usual gable-frame tables.
//
// # Method
//
// Members are Euler–Bernoulli beams (no shear deformation) with optional moment releases
// (hinges) at either end, removed by static condensation. Primary load cases share one
// stiffness matrix, factored once by Cholesky (gonum mat.Cholesky) and solved for all cases;
// combinations are linear sums of primary results. Every solve checks itself: the relative
// residual and the balance of reactions against applied loads must be below 1e-9, or an error
// is returned instead of numbers.
//
// This is a design aid: verify for the site with a qualified structural engineer; local codes
// and licensed practice govern.
package analysis

/**
 * Plates and liquid channels of a scene, solved at each instant in the resistive limit, or with a
 * fast plate's own field where its steady state is defined.
 *
 * <p>Model. A plate or channel is a thin conductor in the plane z = 0: thickness (depth) d,
 * conductivity σ, material velocity v(x, y): the rigid motion of its body (glide, spin,
 * oscillate, path), plus for a liquid the flow profile relative to the channel's walls. Ohm's law
 * in the moving material, J = σ(−∇φ + v × B − ∂A/∂t), with ∇·J = 0 inside, J·n = 0 on the
 * insulating edges and holes, and electrodes that draw no current, fixes the in-plane current
 * (Griffiths, <i>Introduction to Electrodynamics</i>, 4th ed., 2013, §7.1). The conductor's own
 * induced field is neglected: the resistive limit, valid for a magnetic Reynolds number
 * Rm = μ0·σ·d·v ≪ 1 for a plate and μ0·σ·v·L ≪ 1 for a liquid of width L (Davidson,
 * <i>An Introduction to Magnetohydrodynamics</i>, Cambridge, 2001, §4.1); it is computed for
 * every state, with the material's speed or its speed relative to a moving source, whichever is
 * larger. The numerics are {@link org.kinduct.solver.sheet.SheetSolver}'s.
 *
 * <p>Above Rm = {@value org.kinduct.solver.SheetState#REYNOLDS_WARNING} a plate is solved with its
 * own field ({@link org.kinduct.solver.sheet.Plate}, steady state) where that state is defined: the
 * motion is prescribed (no free body in the scene: coupled runs brake bodies in the resistive
 * limit, and their states must match), the field is still (every source on a still body, no AC
 * coil), the plate has no electrodes and either glides at a constant velocity or is a round disc
 * without holes spinning steadily about its centre at a rim Rm of at most 4, and its grid is small
 * enough ({@link OwnField}, {@link SheetModel#ownFieldApplies}). Elsewhere it stays in the resistive limit and outputs warn.
 * Each state says which model made it.
 *
 * <p>The induced field −∂A/∂t of the physical sources. A magnet or steady coil whose body moves
 * rigidly with velocity field w carries its potential along, so −∂A/∂t = ∇(w·A) − w × B
 * (Lie derivative; see {@code RigidInduction}). The gradient part only shifts the potential by
 * w·A: the currents, force and Joule power follow from v × B − w × B alone, and the electrodes'
 * potentials add w·A where they are. An AC-driven coil adds −(di/dt)·A₁, A₁ its potential per
 * ampere of drive. A moving field patch has no physical potential: its −w × B part is known from
 * B_z, so the currents are exact, but its w·A is not, and the electrodes' potentials say so
 * ({@code inducedFieldIncluded}), as wires do.
 *
 * <p>Each conductor's grid is built once, in its body's drawn frame, and reused at every instant:
 * the drive (fields, velocities, induced field) is sampled where each grid point is at that
 * instant and turned into the drawn frame, and the force turned back (see {@link FrameDrive}).
 *
 * <p>In a coupled run the sheets that can move a free body are solved at every evaluation of its
 * equations ({@link SheetBrakes}), on the same grids; their drag, torque and heat enter the
 * body's motion and the energy audit, and each moving source body takes its sources' share back.
 */
package org.kinduct.solver.plate;

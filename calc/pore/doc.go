// Package pore computes what a builder needs to size a thermoacoustic stack
// or regenerator: the thermal and viscous penetration depths of a gas at an
// operating point, Rott's thermoviscous functions fκ and fν for common pore
// shapes, the porosity and hydraulic radius of real packings (plates,
// capillaries, rectangular and honeycomb cells, pin arrays, stacked woven
// screens, random fibres such as metal wool), a verdict on the pore size for
// the chosen role with the rule of thumb beside it, and the standing-wave
// placement numbers of a short stack.
//
// Units are SI throughout: lengths in m, frequencies in Hz, pressures in Pa,
// temperatures in K, mesh counts in 1/m and cell densities in 1/m².
//
// # Sign convention
//
// Time dependence is exp(+iωt), the convention of G. W. Swift,
// Thermoacoustics: A Unifying Perspective for Some Engines and
// Refrigerators (Acoustical Society of America, 2002), chapter 4. In it
// Rott's function f is the cross-sectional average of h, where
//
//	∇²h = (2i/δ²) h  in the gas,   h = 1 on the solid,
//
// so that f → 1 for a pore much narrower than δ and f → (1-i)δ/(2 r_h) for
// a pore much wider; Im f < 0 throughout. Pass the thermal penetration depth
// δκ to get fκ and the viscous one δν to get fν.
//
// # Shapes
//
// Every shape implements Shape. Plates, Circular, Rectangular and Pins are
// exact solutions of the equation above for their geometry; Screens and
// Fibres use the circular pore of the same hydraulic radius as a stated
// approximation (a random matrix has no exact f); Honeycomb uses the square
// (rectangular) solution; BoundaryLayer is the wide-channel limit.
package pore

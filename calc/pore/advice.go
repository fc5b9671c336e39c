package pore

import (
	"fmt"
	"math"

	"tubewright/calc/units"
)

// Device is what the stack is for, for placement advice.
type Device int

const (
	// Engine is a prime mover: heat in, sound out.
	Engine Device = iota
	// HeatPump is a heat pump or refrigerator driven by sound.
	HeatPump
)

// String names the device for people.
func (d Device) String() string {
	if d == HeatPump {
		return "heat pump or refrigerator"
	}
	return "engine"
}

// ParseDevice reads "engine" or "heat-pump" (also "refrigerator",
// "heatpump", "cooler").
func ParseDevice(s string) (Device, error) {
	switch s {
	case "engine", "prime-mover", "":
		return Engine, nil
	case "heat-pump", "heatpump", "refrigerator", "cooler":
		return HeatPump, nil
	}
	return Engine, fmt.Errorf("device %q is not known; use engine or heat-pump", s)
}

// PositionAdvice says in plain words what the stack position means for the
// device, with the numbers of pl. The trade-offs are those of the
// short-stack analysis (Swift 1988, see PlaceStack); the usual positions
// are common practice with no published source.
func PositionAdvice(d Device, pl Placement) string {
	where := "between the pressure antinode and λ/8"
	switch {
	case pl.KX > math.Pi/2:
		where = "beyond the velocity antinode"
	case pl.KX > math.Pi/4:
		where = "between λ/8 and the velocity antinode (λ/4)"
	}
	head := fmt.Sprintf("The stack centre is %s (kx = %s; λ/8 is kx = 0.785). ", where, units.Number(pl.KX, 3))
	if d == HeatPump {
		return head + "A heat pump pumps the most heat per unit drive at λ/8 (heat-flux factor 1; here " +
			units.Number(pl.HeatFluxFactor, 2) + "), while viscous loss grows toward the velocity antinode " +
			"(loss factor here " + units.Number(pl.ViscousFactor, 2) + "); refrigerator stacks are commonly placed " +
			"a little nearer the pressure antinode than λ/8 for a better coefficient of performance (common practice, no published source)."
	}
	return head + "An engine needs a steeper temperature gradient to start the nearer it sits to the pressure antinode " +
		"(critical gradient proportional to cot kx), and suffers more viscous loss the nearer it sits to the velocity antinode; " +
		"engine stacks are commonly placed between the pressure antinode and λ/8, with hot end toward the pressure antinode " +
		"(common practice, no published source)."
}

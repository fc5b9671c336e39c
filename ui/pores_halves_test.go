package ui

import (
	"image"
	"testing"
)

// TestPoresHalves: on the pores screen the plates' gap and half gap show
// together under the field and in the geometry row; switching to the half
// gap (or to a radius) converts the text, and the results stay the same.
func TestPoresHalves(t *testing.T) {
	env := NewEnv(nil)
	s := newPoresScreen(env).(*poresScreen)
	h := newHarness(t, image.Pt(412, 3600), s.Layout)
	const both = "gap 2y0 = 0.5 mm (half gap y0 = 0.25 mm)"
	if got, _ := h.shown("Both sizes of gap"); got != both {
		t.Errorf("under the gap: %q, want %q", got, both)
	}
	// The geometry the terminal echoes says both too.
	geometry := "parallel plates, " + both + ", plate thickness 0.1 mm"
	got := ""
	if r := s.form.Result(); r != nil {
		for _, d := range r.Derived {
			if d.Key == "geometry" {
				got = d.Text
			}
		}
	}
	if got != geometry {
		t.Errorf("geometry %q, want %q", got, geometry)
	}
	verdict, _ := h.shown("Verdict for a stack")
	rh, _ := s.form.Results.Value("Hydraulic radius r_h")

	h.tap("Half gap y0")
	h.frames(2)
	if got := s.form.Text("half-gap"); got != "0.25 mm" || s.form.Text("gap") != "" {
		t.Errorf("after Half gap y0: half gap %q, gap %q", got, s.form.Text("gap"))
	}
	if got, _ := h.shown("Both sizes of half-gap"); got != both {
		t.Errorf("under the half gap: %q, want %q", got, both)
	}
	if got, _ := h.shown("Verdict for a stack"); got != verdict {
		t.Errorf("verdict by half gap %q, by gap %q", got, verdict)
	}
	if got, _ := s.form.Results.Value("Hydraulic radius r_h"); got != rh {
		t.Errorf("r_h by half gap %q, by gap %q", got, rh)
	}

	h.tap("Round pores")
	h.tap("Radius")
	h.frames(2)
	if got := s.form.Text("radius"); got != "0.3 mm" {
		t.Errorf("the example diameter 0.6 mm as a radius: %q", got)
	}
	if got, _ := h.shown("Both sizes of radius"); got != "Ø 0.6 mm (radius 0.3 mm)" {
		t.Errorf("under the radius: %q", got)
	}
}

// TestScreenshotPoresHalves pictures the pores screen with the plates'
// gap typed as a half gap (SHOT_DIR=... to keep the pictures).
func TestScreenshotPoresHalves(t *testing.T) {
	env := NewEnv(nil)
	s := newPoresScreen(env).(*poresScreen)
	s.halves["plates"].Select(sizeHalf)
	s.form.SetText("half-gap", "0.25 mm")
	s.form.SetText("gap", "")
	s.sync()
	shoot(t, "pores-half-gap", env, s)
}

// TestPoresWireAndFibreRadius: the screens' wire and the wool's fibre
// take a radius a chip away, as the other round sizes do: the chip
// converts the text, both sizes show under the field, and the hydraulic
// radius stays the same.
func TestPoresWireAndFibreRadius(t *testing.T) {
	env := NewEnv(nil)
	s := newPoresScreen(env).(*poresScreen)
	h := newHarness(t, image.Pt(412, 3600), s.Layout)
	for _, c := range []struct {
		shape, chip, half, want, both string
	}{
		{"Woven screens", "Wire radius", "wire-radius", "20.5 um", "wire Ø 0.041 mm (wire radius 0.0205 mm)"},
		{"Metal wool / fibres", "Fibre radius", "fibre-radius", "12.5 um", "fibre Ø 0.025 mm (fibre radius 0.0125 mm)"},
	} {
		h.tap(c.shape)
		h.frames(2)
		rh, ok := s.form.Results.Value("Hydraulic radius r_h")
		if !ok || rh == "" {
			t.Fatalf("%s: no hydraulic radius (%q)", c.shape, s.form.Results.Failure())
		}
		h.tap(c.chip)
		h.frames(2)
		if got := s.form.Text(c.half); got != c.want {
			t.Errorf("%s: after %s the radius reads %q, want %q", c.shape, c.chip, got, c.want)
		}
		if got, _ := h.shown("Both sizes of " + c.half); got != c.both {
			t.Errorf("%s: under the radius %q, want %q", c.shape, got, c.both)
		}
		if got, _ := s.form.Results.Value("Hydraulic radius r_h"); got != rh {
			t.Errorf("%s: r_h by radius %q, by diameter %q", c.shape, got, rh)
		}
	}
}

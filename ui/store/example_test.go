package store_test

import (
	"fmt"
	"time"

	"tubewright/ui/store"
)

func ExamplePass_Text() {
	p := store.Pass{
		Time:  time.Date(2026, 12, 1, 22, 30, 0, 0, time.UTC),
		Title: "Safety pass before pressurising",
		Items: []store.Item{
			{ID: "relief", Title: "Relief device set at or below the MAWP", Done: true,
				Numbers: []store.Number{{Name: "Set pressure (gauge)", Value: 3e6, Unit: "Pa", Shown: "30 barg"}}},
			{ID: "leak-check", Title: "Leak check at low pressure first"},
		},
		Cautions: []string{"Estimates for planning only."},
	}
	fmt.Print(p.Text())
	// Output:
	// Safety pass before pressurising
	// Saved: 2026-12-01 22:30:00 +00:00
	// Items ticked: 1 of 2
	//
	//  1. [x] Relief device set at or below the MAWP
	//       Set pressure (gauge): 30 barg
	//  2. [ ] Leak check at low pressure first
	//
	// CAUTIONS
	// - Estimates for planning only.
}

package cell_test

import (
	"fmt"

	"nodelife/engine/cell"
)

func ExampleChemistry_SelfDischargeAt() {
	c, _ := cell.Lookup("li-socl2")
	for _, t := range []float64{0, 20, 40} {
		fmt.Printf("%2.0f °C: %.2f %%/yr\n", t, c.SelfDischargeAt(t)*100)
	}
	// Output:
	//  0 °C: 0.20 %/yr
	// 20 °C: 1.00 %/yr
	// 40 °C: 4.00 %/yr
}

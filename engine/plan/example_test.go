package plan_test

import (
	"fmt"

	"nodelife/engine/plan"
	"nodelife/engine/scenario"
)

func ExampleRun() {
	r, err := plan.Run(scenario.Demo())
	if err != nil {
		panic(err)
	}
	fmt.Println("lasts", r.Lifetime, "- cells flat on", *r.FirstBrownout)
	fmt.Println("first swap", r.Swaps[0].Date, "(due", r.Swaps[0].Due+", "+r.Swaps[0].Reason+")")
	fmt.Printf("average load %.2f mW\n", r.AverageLoadMW)
	// Output:
	// lasts 4 y 10 mo - cells flat on 2032-01-12
	// first swap 2031-07-04 (due 2031-07-18, reserve)
	// average load 1.48 mW
}

package load

import (
	"fmt"
	"testing"

	"github.com/stretchr/testify/assert"

	"nodelife/engine/scenario"
)

func TestBreakdownByHand(t *testing.T) {
	// Hand-computed: sleep 60 µW; vision 5 fps × 200 µJ = 1 mW; events
	// 12 /h × 60 mJ / 3600 s = 0.2 mW; node total 1.26 mW; through an 85 %
	// regulator the cells give 1.26/0.85 = 1.482353 mW, of which
	// 0.222353 mW is the regulator's loss.
	n := scenario.Node{SleepUW: 60, RegulatorEfficiency: 0.85,
		Vision: scenario.Vision{FPS: 5, FrameUJ: 200}, Events: scenario.Events{PerHour: 12, WakeMJ: 60}}
	b := FromNode(n).CellW()
	assert.InEpsilon(t, 60e-6, b[Sleep], 1e-12)
	assert.InEpsilon(t, 1e-3, b[Vision], 1e-12)
	assert.InEpsilon(t, 0.2e-3, b[Events], 1e-12)
	assert.InEpsilon(t, 1.26e-3/0.85-1.26e-3, b[Regulator], 1e-12)
	assert.InEpsilon(t, 1.26e-3/0.85, b.Total(), 1e-12)
}

func TestMoreWorkNeverLess(t *testing.T) {
	base := scenario.Default().Node
	for _, change := range []func(n *scenario.Node){
		func(n *scenario.Node) { n.Vision.FPS *= 2 },
		func(n *scenario.Node) { n.Events.PerHour += 5 },
		func(n *scenario.Node) { n.SleepUW += 10 },
		func(n *scenario.Node) { n.RegulatorEfficiency -= 0.1 },
	} {
		n := base
		change(&n)
		assert.Greater(t, FromNode(n).CellW().Total(), FromNode(base).CellW().Total())
	}
}

func TestComponentNames(t *testing.T) {
	var names []string
	for c := Component(0); c < NumComponents; c++ {
		names = append(names, c.String())
	}
	assert.Equal(t, []string{"sleep", "vision", "events", "regulator"}, names)
}

func ExampleModel_CellW() {
	n := scenario.Node{SleepUW: 60, RegulatorEfficiency: 0.85,
		Vision: scenario.Vision{FPS: 5, FrameUJ: 200}, Events: scenario.Events{PerHour: 12, WakeMJ: 60}}
	b := FromNode(n).CellW()
	for c := Component(0); c < NumComponents; c++ {
		fmt.Printf("%-9s %.3f mW\n", c, b[c]*1e3)
	}
	// Output:
	// sleep     0.060 mW
	// vision    1.000 mW
	// events    0.200 mW
	// regulator 0.222 mW
}

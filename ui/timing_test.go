package ui

import (
	"testing"
	"time"

	"github.com/hajimehoshi/ebiten/v2"
)

func TestRedrawClock(t *testing.T) {
	t0 := time.Date(2027, 3, 1, 12, 0, 0, 0, time.UTC)
	var c redrawClock
	c.commit(t0)
	c.computed(7, t0.Add(40*time.Millisecond))
	if got := c.last; got != (Redraw{Run: 7, ComputeMs: 40}) {
		t.Fatalf("after the compute: %+v, want run 7, 40 ms, not drawn", got)
	}
	c.drew(12, t0.Add(55500*time.Microsecond))
	c.drew(13, t0.Add(90*time.Millisecond)) // a later frame is not the first to show it
	if got, want := c.last, (Redraw{Run: 7, ComputeMs: 40, ToFrameMs: 55.5, Frame: 12}); got != want {
		t.Errorf("after two frames: %+v, want %+v", got, want)
	}
}

// TestRedrawFollowsAnEdit commits an edit of the frame rate and draws: the
// debug state names the change, its compute time and the frame that showed it.
func TestRedrawFollowsAnEdit(t *testing.T) {
	a := newApp(t, 1280, 720)
	screen := ebiten.NewImage(1280, 720)
	a.Draw(screen)
	runs := a.stats.Runs
	if r := a.apply(Edit{Path: "node.vision.fps", Text: "6"}); r != "" {
		t.Fatal(r)
	}
	d := a.Debug().Redraw
	if d.Run != runs+1 || d.ComputeMs <= 0 || d.Frame != 0 || d.ToFrameMs != 0 {
		t.Fatalf("after the edit, before a frame: %+v; want run %d, a compute time, no frame", d, runs+1)
	}
	a.Draw(screen)
	d = a.Debug().Redraw
	if d.Frame != a.stats.Frames || d.ToFrameMs < d.ComputeMs {
		t.Errorf("after the frame: %+v (frames %d); want that frame and a time at least the compute's", d, a.stats.Frames)
	}
}

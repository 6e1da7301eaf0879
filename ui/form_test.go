package ui

import (
	"slices"
	"strings"
	"testing"

	"nodelife/engine/scenario"
)

// laidOutForm is the demo's form in a column tall enough for every row.
func laidOutForm(t *testing.T) *Form {
	t.Helper()
	f := NewForm(scenario.Demo())
	f.Layout(Rect{16, 64, 304, 3000}, Rect{0, 0, 1280, 3100}, fonts(t), Light())
	return f
}

func TestFormRowsOfTheDemo(t *testing.T) {
	f := laidOutForm(t)
	for path, want := range map[string]string{
		"node.vision.fps":      "5",
		"node.events.per_hour": "12",
		"site.indoor_temp_c":   "19",    // the demo is indoors
		"cells.capacity_mah":   "19000", // unset: the D cell's rated capacity
		"site.position":        "59.923, 10.759",
		"site.timezone":        "Europe/Oslo",
		"plan.start":           "2027-03-01",
		"cells.chemistry":      "Li-SOCl2",
		"cells.form":           "D",
		"site.placement":       "indoor",
		"harvest.kind":         "none",
		"site.place":           "Oslo", // within 0.05° of the example place
	} {
		r := f.Row(path)
		if r == nil {
			t.Errorf("no row %s", path)
			continue
		}
		if r.Display() != want || r.Help == "" {
			t.Errorf("%s: shows %q, help %q; want %q and a help line", path, r.Display(), r.Help, want)
		}
	}
	if r := f.Row("node.vision.fps"); r.Slider == nil || r.Slider.Value != 5 {
		t.Errorf("the frame rate has no slider at 5: %+v", r.Slider)
	}
	// The form factors offered are the chemistry's own.
	if r := f.Row("cells.form"); len(r.Choice.Options) != 1 && r.Choice.Options[0].Value != "C" {
		for _, o := range r.Choice.Options {
			if o.Value == "18650" {
				t.Errorf("lithium thionyl chloride offers an 18650: %v", r.Choice.Options)
			}
		}
	}
	// Every group has a title, in the order site, node, cells, harvest,
	// plan, cost.
	var titles []string
	for _, g := range f.groups {
		titles = append(titles, g.title)
	}
	if !slices.Equal(titles, []string{"Site", "Node", "Cells", "Harvest", "Plan", "Cost"}) {
		t.Errorf("groups %v", titles)
	}
}

func TestFormRowsFollowTheScenario(t *testing.T) {
	for _, c := range []struct {
		change func(*scenario.Scenario)
		want   string
	}{
		{func(s *scenario.Scenario) { s.Site.Placement = scenario.Indoor }, "site.indoor_temp_c"},
		{func(s *scenario.Scenario) { s.Site.Placement = scenario.Fixed }, "site.fixed_temp_c"},
		{func(s *scenario.Scenario) { s.Site.Placement, s.Site.Climate.Preset = scenario.Outdoor, "none" }, "site.outdoor_mean_c"},
		{func(s *scenario.Scenario) { s.Site.Placement, s.Site.Climate.Preset = scenario.Outdoor, "subarctic" }, "site.climate.preset"},
		{func(s *scenario.Scenario) { s.Harvest.Kind = scenario.HarvestPanel }, "harvest.panel.area_cm2"},
		{func(s *scenario.Scenario) { s.Harvest.Kind = scenario.HarvestIndoor }, "harvest.indoor.area_cm2"},
	} {
		s := scenario.Demo()
		c.change(&s)
		if f := NewForm(s); f.Row(c.want) == nil {
			t.Errorf("placement %s, climate %s, harvest %s: no row %s", s.Site.Placement, s.Site.Climate.Preset, s.Harvest.Kind, c.want)
		}
	}
	s := scenario.Demo()
	s.Site.Placement, s.Site.Climate.Preset = scenario.Outdoor, "subarctic"
	if f := NewForm(s); f.Row("site.outdoor_mean_c") != nil {
		t.Error("a climate preset outdoors still shows the outdoor mean it overrides")
	}
}

func TestFormClickFocuses(t *testing.T) {
	f := laidOutForm(t)
	fps := f.Row("node.vision.fps")
	x, y := center(fps.Box)
	if changed, edit := f.Update(press(x, y)); !changed || edit != nil {
		t.Fatalf("press on the fps box: changed %v, edit %v; want true, nil", changed, edit)
	}
	if f.Focused() != fps || !fps.Text.Selected {
		t.Fatalf("press on the fps box: focused %v, selected %v", f.Focused(), fps.Text.Selected)
	}
	// A second press on the focused field puts the caret at the end.
	f.Update(press(x, y))
	if fps.Text.Selected || fps.Text.Caret != len(fps.Text.Text) {
		t.Errorf("second press: Selected %v Caret %d, want false %d", fps.Text.Selected, fps.Text.Caret, len(fps.Text.Text))
	}
	// A press outside every row gives up the focus.
	f.Update(press(f.View.Right()+300, y))
	if f.Focused() != nil || fps.Focused() {
		t.Errorf("press outside: focus still on %v", f.Focused())
	}
}

func TestFormTabOrder(t *testing.T) {
	f := laidOutForm(t)
	f.Update(keys(KeyTab))
	if f.Focused() != f.Rows[0] {
		t.Fatalf("Tab with no focus: focused %v, want the first row", f.Focused())
	}
	for i := 1; i < len(f.Rows); i++ {
		f.Update(keys(KeyTab))
		if f.Focused() != f.Rows[i] {
			t.Fatalf("Tab %d: focused %s, want %s", i, f.Focused().Path, f.Rows[i].Path)
		}
	}
	f.Update(keys(KeyTab))
	if f.Focused() != f.Rows[0] {
		t.Errorf("Tab on the last row: focused %s, want the first", f.Focused().Path)
	}
	f.Update(shiftKeys(KeyTab))
	if f.Focused() != f.Rows[len(f.Rows)-1] {
		t.Errorf("Shift+Tab on the first row: focused %s, want the last", f.Focused().Path)
	}
	for i, r := range f.Rows {
		if r.Focused() != (i == len(f.Rows)-1) {
			t.Errorf("row %s: Focused %v", r.Path, r.Focused())
		}
	}
}

// focusRow puts the keyboard on the row with path by Tab presses.
func focusRow(t *testing.T, f *Form, path string) *Row {
	t.Helper()
	for range len(f.Rows) + 1 {
		if r := f.Focused(); r != nil && r.Path == path {
			return r
		}
		f.Update(keys(KeyTab))
	}
	t.Fatalf("Tab never reaches %s", path)
	return nil
}

func TestFormTabCommitsAndWaitsForTheVerdict(t *testing.T) {
	f := laidOutForm(t)
	fps := focusRow(t, f, "node.vision.fps")
	f.Update(chars("61"))
	_, edit := f.Update(keys(KeyTab))
	if edit == nil || edit.Path != "node.vision.fps" || edit.Text != "61" {
		t.Fatalf("Tab after typing: edit %+v, want fps \"61\"", edit)
	}
	f.Settle("61 is out of range", scenario.Demo())
	if f.Focused() != fps || fps.Err() != "61 is out of range" || fps.Text.Text != "61" {
		t.Fatalf("refused: focus %s, Err %q, Text %q; want the focus kept on fps with the reason and the text", f.Focused().Path, fps.Err(), fps.Text.Text)
	}
	// Fixed and accepted: the focus moves on, the value is the engine's.
	f.Update(keys(KeySelectAll))
	f.Update(chars("07"))
	if _, edit = f.Update(keys(KeyTab)); edit == nil {
		t.Fatal("Tab after retyping: no edit")
	}
	s := scenario.Demo()
	s.Node.Vision.FPS = 7
	f.Settle("", s)
	next := f.Rows[indexOf(f, fps)+1]
	if f.Focused() != next || fps.Err() != "" || fps.Text.Text != "7" || fps.Slider.Value != 7 {
		t.Errorf("accepted: focus %s, fps Err %q Text %q slider %g; want %s, no error, \"7\" both", f.Focused().Path, fps.Err(), fps.Text.Text, fps.Slider.Value, next.Path)
	}
}

func indexOf(f *Form, r *Row) int {
	for i, x := range f.Rows {
		if x == r {
			return i
		}
	}
	return -1
}

func TestFormClickAwayKeepsARefusedValueMarked(t *testing.T) {
	f := laidOutForm(t)
	fps, ev := f.Row("node.vision.fps"), f.Row("node.events.per_hour")
	f.Update(press(center(fps.Box)))
	f.Update(chars("-3"))
	_, edit := f.Update(press(center(ev.Box)))
	if edit == nil {
		t.Fatal("click on another field after typing: no edit")
	}
	f.Settle("-3 is out of range", scenario.Demo())
	if f.Focused() != ev {
		t.Errorf("focus %v, want the clicked field", f.Focused())
	}
	if fps.Err() == "" || fps.Text.Text != "-3" {
		t.Errorf("the refused field shows Text %q Err %q; want the bad text and its reason", fps.Text.Text, fps.Err())
	}
	// Escape on the refused field brings the committed value back.
	f.Update(press(center(fps.Box)))
	f.Update(keys(KeyEscape))
	if fps.Text.Text != "5" || fps.Err() != "" || f.Focused() != nil {
		t.Errorf("Escape: Text %q Err %q focus %v; want \"5\", no error, no focus", fps.Text.Text, fps.Err(), f.Focused())
	}
}

func TestFormDropDownByPointer(t *testing.T) {
	f := laidOutForm(t)
	chem := f.Row("cells.chemistry")
	if changed, edit := f.Update(press(center(chem.Box))); !changed || edit != nil || f.OpenList() != chem {
		t.Fatalf("press on the chemistry box: changed %v edit %v open %v; want the list open", changed, edit, f.OpenList())
	}
	c := chem.Choice
	if c.List.Empty() || !c.List.Within(f.Screen) || c.List.W < chem.Box.W {
		t.Fatalf("list at %v, box %v, screen %v", c.List, chem.Box, f.Screen)
	}
	// Pointing at an item highlights it; pressing it picks it.
	i := optionIndex(c, "li-ion")
	item := Rect{c.List.X, c.List.Y + listPad + float64(i)*c.ItemH, c.List.W, c.ItemH}
	f.Update(&Input{MouseX: item.X + 20, MouseY: item.Y + item.H/2})
	if c.Highlight != i {
		t.Errorf("hover on li-ion: highlight %d, want %d", c.Highlight, i)
	}
	_, edit := f.Update(press(item.X+20, item.Y+item.H/2))
	if edit == nil || edit.Path != "cells.chemistry" || edit.Text != "li-ion" || f.OpenList() != nil {
		t.Fatalf("press on li-ion: edit %+v, open %v", edit, f.OpenList())
	}
	s, err := applyEdit(scenario.Demo(), *edit)
	if err != nil {
		t.Fatal(err)
	}
	f.Settle("", s)
	if chem.Choice.Value() != "li-ion" || f.Row("cells.form").Choice.Value() != "18650" {
		t.Errorf("after the pick: chemistry %q form %q; want li-ion and its 18650 (no D cell)", chem.Choice.Value(), f.Row("cells.form").Choice.Value())
	}
	// A press outside an open list closes it and does nothing else.
	f.Update(press(center(chem.Box)))
	fps := f.Row("node.vision.fps")
	if _, edit := f.Update(press(center(fps.Box))); edit != nil || f.OpenList() != nil || f.Focused() != chem {
		t.Errorf("press outside the list: edit %v open %v focus %v; want the list closed, focus kept", edit, f.OpenList(), f.Focused())
	}
}

func optionIndex(c *Choice, v string) int {
	for i, o := range c.Options {
		if o.Value == v {
			return i
		}
	}
	return -1
}

func TestFormChoiceByKeyboard(t *testing.T) {
	f := laidOutForm(t)
	chem := focusRow(t, f, "cells.chemistry")
	c := chem.Choice
	start := c.Index
	// Arrows on a closed drop-down pick the neighbour at once.
	_, edit := f.Update(keys(KeyDown))
	if edit == nil || edit.Text != c.Options[start+1].Value {
		t.Fatalf("Down: edit %+v, want %s", edit, c.Options[start+1].Value)
	}
	f.Settle("a reason", scenario.Demo()) // refused: the choice stays, the reason shows
	if c.Index != start || chem.Err() != "a reason" {
		t.Errorf("refused pick: index %d err %q", c.Index, chem.Err())
	}
	// Enter opens, arrows move the highlight, Enter picks, Escape closes.
	f.Update(keys(KeyEnter))
	if f.OpenList() != chem {
		t.Fatal("Enter did not open the list")
	}
	f.Update(keys(KeyUp))
	if _, edit = f.Update(keys(KeyEnter)); edit == nil || edit.Text != c.Options[start-1].Value || f.OpenList() != nil {
		t.Fatalf("Up, Enter: edit %+v open %v", edit, f.OpenList())
	}
	f.Settle("", scenario.Demo())
	f.Update(chars(" "))
	f.Update(keys(KeyEscape))
	if f.OpenList() != nil || f.Focused() != chem {
		t.Errorf("Escape on an open list: open %v focus %v; want closed, focus kept", f.OpenList(), f.Focused())
	}
}

func TestFormSegmentsPick(t *testing.T) {
	f := laidOutForm(t)
	pl := f.Row("site.placement")
	seg := pl.Box.W / 3
	_, edit := f.Update(press(pl.Box.X+seg/2, pl.Box.Y+pl.Box.H/2))
	if edit == nil || edit.Path != "site.placement" || edit.Text != scenario.Outdoor {
		t.Fatalf("press on the first segment: edit %+v, want outdoor", edit)
	}
	s, err := applyEdit(scenario.Demo(), *edit)
	if err != nil {
		t.Fatal(err)
	}
	f.Settle("", s)
	if f.Row("site.indoor_temp_c") != nil || f.Row("site.climate.preset") == nil || f.Focused().Path != "site.placement" {
		t.Errorf("outdoors: rows %v, focus %v; want the climate instead of the indoor temperature, focus kept", f.paths(), f.Focused())
	}
}

func TestFormSliderDrag(t *testing.T) {
	f := laidOutForm(t)
	fps := f.Row("node.vision.fps")
	tr := fps.Slider.Track
	y := tr.Y + tr.H/2
	// Press on the knob, drag to the track's end, let go.
	x := fps.Slider.KnobX()
	if _, edit := f.Update(&Input{MouseX: x, MouseY: y, Pressed: true, Down: true}); edit != nil || !f.Dragging() {
		t.Fatalf("press on the knob: edit %v dragging %v; want a drag, no change yet", edit, f.Dragging())
	}
	_, edit := f.Update(&Input{MouseX: tr.Right() + 40, MouseY: y + 30, Down: true})
	if edit == nil || !edit.Drag || edit.Text != "30" || fps.Text.Text != "30" {
		t.Fatalf("drag past the end: edit %+v text %q; want a drag edit to the last stop, 30", edit, fps.Text.Text)
	}
	_, edit = f.Update(&Input{MouseX: tr.X + tr.W/2, MouseY: y, Down: true})
	mid := fpsStops[len(fpsStops)/2]
	if edit == nil || edit.Text != FormatNumber(mid) {
		t.Fatalf("drag to the middle: edit %+v, want the middle stop %g", edit, mid)
	}
	_, edit = f.Update(&Input{MouseX: tr.X + tr.W/2, MouseY: y, Released: true})
	if edit == nil || edit.Drag || f.Dragging() {
		t.Errorf("release: edit %+v dragging %v; want the final edit", edit, f.Dragging())
	}
}

func TestSliderScale(t *testing.T) {
	s := &Slider{Stops: []float64{0, 1, 2, 5, 10}, Track: Rect{100, 0, 400, 10}}
	for _, c := range []struct{ v, pos float64 }{{0, 0}, {1, 0.25}, {3.5, 0.625}, {10, 1}, {50, 1}, {-1, 0}} {
		if got := s.Pos(c.v); got != c.pos {
			t.Errorf("Pos(%g) = %g, want %g", c.v, got, c.pos)
		}
	}
	for _, c := range []struct{ f, v float64 }{{0, 0}, {0.3, 1}, {0.4, 2}, {0.99, 10}, {1.5, 10}} {
		if got := s.StopAt(c.f); got != c.v {
			t.Errorf("StopAt(%g) = %g, want %g", c.f, got, c.v)
		}
	}
}

func TestFormLayoutRows(t *testing.T) {
	f := laidOutForm(t)
	for i, r := range f.Rows {
		if !r.Box.Within(r.Row) || !r.Row.Within(f.View) {
			t.Errorf("%s: box %v row %v view %v: box must be in its row, row in the column", r.Path, r.Box, r.Row, f.View)
		}
		if r.Slider != nil && !r.Slider.Track.Within(r.Row) {
			t.Errorf("%s: slider %v outside its row %v", r.Path, r.Slider.Track, r.Row)
		}
		if i > 0 && r.Row.Overlaps(f.Rows[i-1].Row) {
			t.Errorf("%s overlaps %s", r.Path, f.Rows[i-1].Path)
		}
		if got := fonts(t).Advance(r.label, Light().bodyStyle()); got > r.Box.X-r.Row.X-labelToBox {
			t.Errorf("%s: label %q is %g px, runs into the box", r.Path, r.label, got)
		}
		if r.label != r.Label {
			t.Errorf("%s: label %q shortened to %q in a %g px column", r.Path, r.Label, r.label, f.View.W)
		}
	}
}

func TestFormScrollsWhenShort(t *testing.T) {
	f := NewForm(scenario.Demo())
	f.Layout(Rect{16, 64, 272, 300}, Rect{0, 0, 760, 720}, fonts(t), Light())
	if f.Content <= f.View.H {
		t.Fatalf("content %g fits in %g px: the test needs a column too short", f.Content, f.View.H)
	}
	last := f.Rows[len(f.Rows)-1]
	f.Update(shiftKeys(KeyTab)) // no focus: Shift+Tab goes to the last row
	if f.Focused() != last {
		t.Fatalf("focus %v, want the last row", f.Focused())
	}
	if !last.Row.Within(f.View) || f.ScrollY <= 0 {
		t.Errorf("last row %v not revealed in %v (scroll %g)", last.Row, f.View, f.ScrollY)
	}
	// The wheel scrolls back to the top and no further.
	x, y := center(f.View)
	f.Update(&Input{MouseX: x, MouseY: y, WheelY: 1000})
	if f.ScrollY != 0 || f.Rows[0].Row.Y != f.View.Y+f.groups[0].titleAt.H+titleGap {
		t.Errorf("after scrolling up: ScrollY %g, first row at %g", f.ScrollY, f.Rows[0].Row.Y)
	}
}

func TestFormHelpIsOneLineUntilFocused(t *testing.T) {
	f := NewForm(scenario.Demo())
	view, screen := Rect{16, 64, 272, 3000}, Rect{0, 0, 760, 3100}
	f.Layout(view, screen, fonts(t), Light())
	long := f.Row("site.position") // its full help does not fit one line of 272 px
	line, full := long.HelpLine, long.Help
	if len(long.help) != 1 || long.help[0] != line || strings.HasSuffix(line, "…") {
		t.Fatalf("unfocused help %q; want the short line %q whole", long.help, line)
	}
	h := long.Row.H
	click := func(r Rect) { f.Update(press(center(r))) }
	click(long.Box)
	f.Layout(view, screen, fonts(t), Light())
	if len(long.help) < 2 || strings.Join(long.help, " ") != full || !strings.Contains(full, "paste") || long.Row.H <= h {
		t.Errorf("focused help %q (row %g px, was %g); want the full text %q, wrapped", long.help, long.Row.H, h, full)
	}
}

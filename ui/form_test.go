package ui

import (
	"testing"

	"nodelife/engine/scenario"
)

// laidOutForm is the demo's form in a column tall enough for every field.
func laidOutForm(t *testing.T) *Form {
	t.Helper()
	f := NewForm(scenario.Demo())
	f.Layout(Rect{16, 64, 288, 2000}, fonts(t), Light())
	return f
}

func TestFormFieldsOfTheDemo(t *testing.T) {
	f := laidOutForm(t)
	for path, want := range map[string]string{
		"node.vision.fps":      "5",
		"node.events.per_hour": "12",
		"site.indoor_temp_c":   "19",    // the demo is indoors
		"cells.capacity_mah":   "19000", // unset: the D cell's rated capacity
	} {
		nf := f.Field(path)
		if nf == nil {
			t.Errorf("no field %s", path)
			continue
		}
		if nf.Text != want || nf.Unit == "" || nf.Help == "" {
			t.Errorf("%s: Text %q Unit %q Help %q; want Text %q and a unit and help", path, nf.Text, nf.Unit, nf.Help, want)
		}
	}
}

func TestFormTemperatureFollowsPlacement(t *testing.T) {
	for placement, path := range map[string]string{
		scenario.Indoor: "site.indoor_temp_c", scenario.Fixed: "site.fixed_temp_c", scenario.Outdoor: "site.outdoor_mean_c",
	} {
		s := scenario.Demo()
		s.Site.Placement = placement
		f := NewForm(s)
		if f.Field(path) == nil {
			t.Errorf("placement %s: no field %s", placement, path)
		}
	}
}

func TestFormClickFocuses(t *testing.T) {
	f := laidOutForm(t)
	fps := f.Field("node.vision.fps")
	x, y := center(fps.Box)
	if changed, edit := f.Update(press(x, y)); !changed || edit != nil {
		t.Fatalf("press on the fps box: changed %v, edit %v; want true, nil", changed, edit)
	}
	if f.Focused() != fps || !fps.Selected {
		t.Fatalf("press on the fps box: focused %v, selected %v", f.Focused(), fps.Selected)
	}
	// A second press on the focused field puts the caret at the end.
	f.Update(press(x, y))
	if fps.Selected || fps.Caret != len(fps.Text) {
		t.Errorf("second press: Selected %v Caret %d, want false %d", fps.Selected, fps.Caret, len(fps.Text))
	}
	// A press outside every field gives up the focus.
	f.Update(press(f.View.Right()+300, y))
	if f.Focused() != nil || fps.Focused {
		t.Errorf("press outside: focus still on %v", f.Focused())
	}
}

func TestFormTabOrder(t *testing.T) {
	f := laidOutForm(t)
	f.Update(keys(KeyTab))
	if f.Focused() != f.Fields[0] {
		t.Fatalf("Tab with no focus: focused %v, want the first field", f.Focused())
	}
	for i := 1; i < len(f.Fields); i++ {
		f.Update(keys(KeyTab))
		if f.Focused() != f.Fields[i] {
			t.Fatalf("Tab %d: focused %s, want %s", i, f.Focused().Path, f.Fields[i].Path)
		}
	}
	f.Update(keys(KeyTab))
	if f.Focused() != f.Fields[0] {
		t.Errorf("Tab on the last field: focused %s, want the first", f.Focused().Path)
	}
	f.Update(shiftKeys(KeyTab))
	if f.Focused() != f.Fields[len(f.Fields)-1] {
		t.Errorf("Shift+Tab on the first field: focused %s, want the last", f.Focused().Path)
	}
	for i, nf := range f.Fields {
		if nf.Focused != (i == len(f.Fields)-1) {
			t.Errorf("field %s: Focused %v", nf.Path, nf.Focused)
		}
	}
}

func TestFormTabCommitsAndWaitsForTheVerdict(t *testing.T) {
	f := laidOutForm(t)
	f.Update(keys(KeyTab))
	f.Update(chars("61"))
	_, edit := f.Update(keys(KeyTab))
	if edit == nil || edit.Path != "node.vision.fps" || edit.Text != "61" {
		t.Fatalf("Tab after typing: edit %+v, want fps \"61\"", edit)
	}
	f.Settle("61 is out of range")
	fps := f.Fields[0]
	if f.Focused() != fps || fps.Err != "61 is out of range" || fps.Text != "61" {
		t.Fatalf("refused: focus %s, Err %q, Text %q; want the focus kept on fps with the reason and the text", f.Focused().Path, fps.Err, fps.Text)
	}
	// Fixed and accepted: the focus moves on.
	f.Update(keys(KeySelectAll))
	f.Update(chars("7"))
	if _, edit = f.Update(keys(KeyTab)); edit == nil {
		t.Fatal("Tab after retyping: no edit")
	}
	fps.Value = "7" // what the app's SetValues does
	f.Settle("")
	if f.Focused() != f.Fields[1] || fps.Err != "" {
		t.Errorf("accepted: focus %s, fps Err %q; want the next field, no error", f.Focused().Path, fps.Err)
	}
}

func TestFormClickAwayKeepsARefusedValueMarked(t *testing.T) {
	f := laidOutForm(t)
	fps, ev := f.Field("node.vision.fps"), f.Field("node.events.per_hour")
	f.Update(press(center(fps.Box)))
	f.Update(chars("-3"))
	_, edit := f.Update(press(center(ev.Box)))
	if edit == nil {
		t.Fatal("click on another field after typing: no edit")
	}
	f.Settle("-3 is out of range")
	if f.Focused() != ev {
		t.Errorf("focus %v, want the clicked field", f.Focused())
	}
	if fps.Err == "" || fps.Text != "-3" {
		t.Errorf("the refused field shows Text %q Err %q; want the bad text and its reason", fps.Text, fps.Err)
	}
	// Escape on the refused field brings the committed value back.
	f.Update(press(center(fps.Box)))
	f.Update(keys(KeyEscape))
	if fps.Text != "5" || fps.Err != "" || f.Focused() != nil {
		t.Errorf("Escape: Text %q Err %q focus %v; want \"5\", no error, no focus", fps.Text, fps.Err, f.Focused())
	}
}

func TestFormLayoutRows(t *testing.T) {
	f := laidOutForm(t)
	for i, nf := range f.Fields {
		if !nf.Box.Within(nf.Row) || !nf.Row.Within(f.View) {
			t.Errorf("%s: box %v row %v view %v: box must be in its row, row in the column", nf.Path, nf.Box, nf.Row, f.View)
		}
		if i > 0 && nf.Row.Overlaps(f.Fields[i-1].Row) {
			t.Errorf("%s overlaps %s", nf.Path, f.Fields[i-1].Path)
		}
		if got := fonts(t).Advance(nf.label, Light().bodyStyle()); got > nf.Box.X-nf.Row.X-labelToBox {
			t.Errorf("%s: label %q is %g px, runs into the box", nf.Path, nf.label, got)
		}
	}
}

func TestFormScrollsWhenShort(t *testing.T) {
	f := NewForm(scenario.Demo())
	f.Layout(Rect{16, 64, 264, 300}, fonts(t), Light())
	if f.Content <= f.View.H {
		t.Fatalf("content %g fits in %g px: the test needs a column too short", f.Content, f.View.H)
	}
	last := f.Fields[len(f.Fields)-1]
	f.Update(shiftKeys(KeyTab)) // no focus: Shift+Tab goes to the last field
	if f.Focused() != last {
		t.Fatalf("focus %v, want the last field", f.Focused())
	}
	if !last.Row.Within(f.View) || f.ScrollY <= 0 {
		t.Errorf("last field's row %v not revealed in %v (scroll %g)", last.Row, f.View, f.ScrollY)
	}
	// The wheel scrolls back to the top and no further.
	x, y := center(f.View)
	f.Update(&Input{MouseX: x, MouseY: y, WheelY: 1000})
	if f.ScrollY != 0 || f.Fields[0].Row.Y != f.View.Y+f.groups[0].titleAt.H+titleGap {
		t.Errorf("after scrolling up: ScrollY %g, first row at %g", f.ScrollY, f.Fields[0].Row.Y)
	}
}

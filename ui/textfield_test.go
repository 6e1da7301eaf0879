package ui

import "testing"

func focusedField(text string) *TextField {
	f := &TextField{Unit: "fps", Step: 1, Min: 0, Max: 60}
	f.SetValue(text)
	f.Focus()
	return f
}

func TestTextFieldTypingReplacesSelection(t *testing.T) {
	f := focusedField("5")
	if !f.Selected {
		t.Fatal("Focus() did not select the text")
	}
	if ev := f.Update(chars("12")); ev != FieldEdited {
		t.Errorf("typing: event %v, want FieldEdited", ev)
	}
	if f.Text != "12" || f.Caret != 2 || f.Selected {
		t.Errorf("after typing 12: Text %q Caret %d Selected %v, want \"12\" 2 false", f.Text, f.Caret, f.Selected)
	}
	if !f.Edited() || f.Value != "5" {
		t.Errorf("Edited() = %v, Value %q; want true, \"5\"", f.Edited(), f.Value)
	}
}

func TestTextFieldFiltersCharacters(t *testing.T) {
	f := focusedField("")
	f.Update(chars("a2,5 x"))
	if f.Text != "2.5" {
		t.Errorf("typed \"a2,5 x\": Text %q, want \"2.5\" (letters dropped, comma as point)", f.Text)
	}
	f.Update(chars("11111111111111111111111111111"))
	if len(f.Text) != maxFieldChars {
		t.Errorf("long input: %d characters kept, want %d", len(f.Text), maxFieldChars)
	}
}

func TestTextFieldCaretEditing(t *testing.T) {
	f := focusedField("1234")
	f.Update(keys(KeyLeft)) // selection → caret at the start
	if f.Caret != 0 || f.Selected {
		t.Fatalf("Left on a selection: Caret %d Selected %v, want 0 false", f.Caret, f.Selected)
	}
	f.Update(keys(KeyEnd, KeyLeft, KeyBackspace))
	if f.Text != "124" || f.Caret != 2 {
		t.Errorf("End, Left, Backspace: Text %q Caret %d, want \"124\" 2", f.Text, f.Caret)
	}
	f.Update(keys(KeyHome, KeyDelete))
	if f.Text != "24" || f.Caret != 0 {
		t.Errorf("Home, Delete: Text %q Caret %d, want \"24\" 0", f.Text, f.Caret)
	}
	f.Update(keys(KeyBackspace)) // at the start: nothing to delete
	if f.Text != "24" {
		t.Errorf("Backspace at the start changed the text to %q", f.Text)
	}
	f.Update(keys(KeySelectAll, KeyBackspace))
	if f.Text != "" {
		t.Errorf("select all, Backspace: Text %q, want empty", f.Text)
	}
}

func TestTextFieldEndingKeys(t *testing.T) {
	for _, c := range []struct {
		name string
		in   *Input
		want FieldEvent
	}{
		{"Enter", keys(KeyEnter), FieldCommit},
		{"Tab", keys(KeyTab), FieldNext},
		{"Shift+Tab", shiftKeys(KeyTab), FieldPrev},
		{"Up", keys(KeyUp), FieldNudged},
		{"Escape", keys(KeyEscape), FieldCancel},
	} {
		f := focusedField("5")
		f.Update(chars("9"))
		if ev := f.Update(c.in); ev != c.want {
			t.Errorf("%s: event %v, want %v", c.name, ev, c.want)
		}
	}
}

func TestTextFieldEscapeRestores(t *testing.T) {
	f := focusedField("5")
	f.Update(chars("61"))
	f.Refuse("61 is out of range")
	f.Update(keys(KeyEscape))
	if f.Text != "5" || f.Err != "" || f.Focused {
		t.Errorf("Escape: Text %q Err %q Focused %v, want \"5\", no error, not focused", f.Text, f.Err, f.Focused)
	}
}

func TestTextFieldIgnoresInputWithoutFocus(t *testing.T) {
	f := &TextField{Step: 1, Max: 60}
	f.SetValue("5")
	if ev := f.Update(chars("9")); ev != FieldIdle || f.Text != "5" {
		t.Errorf("unfocused field took input: event %v, Text %q", ev, f.Text)
	}
}

func TestTextFieldNudge(t *testing.T) {
	for _, c := range []struct {
		text    string
		in      *Input
		step    float64
		integer bool
		want    string
	}{
		{"5", keys(KeyUp), 1, false, "6"},
		{"5", keys(KeyDown), 1, false, "4"},
		{"4.3", keys(KeyUp), 1, false, "5"},   // lands on a multiple of the step
		{"4.3", keys(KeyDown), 1, false, "4"}, // … both ways
		{"59.5", keys(KeyUp), 1, false, "60"}, // stops at Max
		{"0", keys(KeyDown), 1, false, "0"},   // stops at Min
		{"5", shiftKeys(KeyUp), 1, false, "15"},
		{"0.85", keys(KeyUp), 0.05, false, "0.9"}, // no binary noise
		{"abc", keys(KeyUp), 1, false, "8"},       // bad text: from the committed value 7
		{"3", keys(KeyUp), 0.5, true, "4"},        // whole numbers stay whole (3.5 rounds up)
	} {
		f := &TextField{Step: c.step, Min: 0, Max: 60, Integer: c.integer}
		f.SetValue("7")
		f.Focus()
		f.Text = c.text
		f.Update(c.in)
		if f.Text != c.want {
			t.Errorf("nudge %q (step %g, shift %v): Text %q, want %q", c.text, c.step, c.in.Shift, f.Text, c.want)
		}
	}
}

func TestFormatNumber(t *testing.T) {
	for _, c := range []struct {
		v    float64
		want string
	}{
		{0.1 + 0.2, "0.3"}, // 0.30000000000000004 in binary
		{19000, "19000"},
		{-0.0, "0"},
		{59.923, "59.923"},
		{1e6, "1000000"},
	} {
		if got := FormatNumber(c.v); got != c.want {
			t.Errorf("FormatNumber(%v) = %q, want %q", c.v, got, c.want)
		}
	}
}

func TestTextFieldModesFilterCharacters(t *testing.T) {
	for _, c := range []struct {
		mode       TextMode
		typed, got string
	}{
		{DateText, "2027-03-x1", "2027-03-1"},
		{PositionText, "59.91° N, 10.75° E!", "59.91 N, 10.75 E"},
		{ZoneText, "America/Los_Angeles ", "America/Los_Angeles"},
		{NumberText, "1,5", "1.5"},
	} {
		f := &TextField{Mode: c.mode}
		f.Focus()
		f.Update(chars(c.typed))
		if f.Text != c.got {
			t.Errorf("mode %d: typed %q, Text %q, want %q", c.mode, c.typed, f.Text, c.got)
		}
	}
}

func TestTextFieldDateNudge(t *testing.T) {
	for _, c := range []struct {
		text string
		in   *Input
		want string
	}{
		{"2027-03-01", keys(KeyUp), "2027-03-02"},
		{"2027-03-01", keys(KeyDown), "2027-02-28"},
		{"2028-02-28", keys(KeyUp), "2028-02-29"},      // a leap day
		{"2027-01-31", shiftKeys(KeyUp), "2027-02-28"}, // a month on, kept in February
		{"2027-03-15", shiftKeys(KeyDown), "2027-02-15"},
		{"2079-12-31", keys(KeyUp), "2079-12-31"}, // the format's last day
		{"garbled", keys(KeyUp), "2027-01-02"},    // from the committed value
	} {
		f := &TextField{Mode: DateText}
		f.SetValue("2027-01-01")
		f.Focus()
		f.Text = c.text
		if ev := f.Update(c.in); ev != FieldNudged {
			t.Errorf("%q: event %v, want FieldNudged", c.text, ev)
		}
		if f.Text != c.want {
			t.Errorf("nudge %q (shift %v): %q, want %q", c.text, c.in.Shift, f.Text, c.want)
		}
	}
	// A position does not step.
	f := &TextField{Mode: PositionText}
	f.SetValue("59.91, 10.75")
	f.Focus()
	if ev := f.Update(keys(KeyUp)); ev != FieldIdle || f.Text != "59.91, 10.75" {
		t.Errorf("Up in a position: event %v Text %q; want nothing", ev, f.Text)
	}
}

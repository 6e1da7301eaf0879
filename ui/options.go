package ui

import (
	"bytes"
	"encoding/json"
	"errors"
	"fmt"
	"strings"
	"time"

	"nodelife/engine/plan"
	"nodelife/engine/scenario"
)

// The options view sets the scenario being edited beside up to three kept
// ones: the user keeps a scenario, changes an input, and reads the two side
// by side with their lifetime, swaps and cost of ownership (plan.Compare).

// keptOption is a scenario the user kept to compare with the one being
// edited, with its planned result.
type keptOption struct {
	Letter string // "A", "B" or "C"; the view calls it "Option A"
	Scen   scenario.Scenario
	Res    plan.Result
}

// Name is the option's name in the view and the comparison.
func (k keptOption) Name() string { return "Option " + k.Letter }

// maxKept is how many scenarios can be kept: the one being edited is always
// an option too, and a comparison takes at most plan.MaxOptions.
const maxKept = plan.MaxOptions - 1

// currentName is the options view's name for the scenario being edited.
const currentName = "Current"

// nextLetter is the first of A, B, C that no kept option has, or "".
func nextLetter(kept []keptOption) string {
	if l := nextLetters(kept); l != "" {
		return l[:1]
	}
	return ""
}

// OptionsContent is what the options view shows: the kept options and the
// scenario being edited, last.
type OptionsContent struct {
	Kept       []keptOption
	Current    scenario.Scenario
	CurrentRes plan.Result
}

// compare plans the view's comparison: every option's costs (each in its
// own currency), and when the options can be compared, the comparison; else
// err says why not, in the words of plan.OptionError.
func (c OptionsContent) compare() (costs []plan.OptionCost, cmp plan.Comparison, err error) {
	var opts []plan.Option
	for _, k := range c.Kept {
		opts = append(opts, plan.Option{Name: k.Name(), Scenario: k.Scen, Result: k.Res})
	}
	opts = append(opts, plan.Option{Name: currentName, Scenario: c.Current, Result: c.CurrentRes})
	for _, o := range opts {
		costs = append(costs, plan.CostOf(o.Name, o.Scenario, o.Result))
	}
	if len(opts) < plan.MinOptions {
		return costs, plan.Comparison{}, nil
	}
	cmp, err = plan.Compare(opts)
	return costs, cmp, err
}

// compareProblem words an error from Compare for the view.
func compareProblem(err error) string {
	var oe *plan.OptionError
	if errors.As(err, &oe) {
		return fmt.Sprintf("These options cannot be compared: %s's %s", oe.Name,
			oe.Message(func(int) string { return oe.OtherName }))
	}
	return "These options cannot be compared: " + err.Error()
}

// differences says in a few words how a kept scenario differs from the
// current one, input by input as the form shows them ("Frame rate 2 fps"),
// at most three, then how many more; "same inputs as Current" when none of
// the form's inputs differ.
func differences(kept, cur scenario.Scenario) string {
	if bytes.Equal(kept.JSON(), cur.JSON()) {
		return "the same as " + currentName
	}
	shown := func(s scenario.Scenario) map[string]string {
		out := map[string]string{}
		for _, g := range specsFor(s) {
			for _, sp := range g.fields {
				r := newRow(s, sp)
				v := r.Display()
				if r.Text != nil && r.Text.Unit != "" && v != "" {
					v += " " + r.Text.Unit
				}
				out[sp.path] = v
			}
		}
		return out
	}
	a, b := shown(kept), shown(cur)
	var parts []string
	for _, g := range specsFor(kept) {
		for _, sp := range g.fields {
			if sp.path == pathPlace { // the position says it
				continue
			}
			if v, ok := b[sp.path]; !ok || v != a[sp.path] {
				parts = append(parts, sp.label+" "+a[sp.path])
			}
		}
	}
	switch {
	case len(parts) == 0:
		return "other settings differ from " + currentName
	case len(parts) > 3:
		return strings.Join(parts[:3], "; ") + fmt.Sprintf("; %d more", len(parts)-3)
	}
	return strings.Join(parts, "; ")
}

// optionRow is one line of the comparison table: a label and how to show
// an option's value.
type optionRow struct {
	label  string
	strong bool // drawn in the medium weight: the answer's lines
	rule   bool // a rule above it: a new group of rows
	value  func(o plan.OptionCost, s scenario.Scenario) string
}

// optionRows are the table's lines, the same as `nodelife compare` prints.
var optionRows = []optionRow{
	{label: "Cells", value: func(o plan.OptionCost, s scenario.Scenario) string {
		return fmt.Sprintf("%d × %s %s", o.CellsPerSet, o.Form, choiceLabel(s, "cells.chemistry"))
	}},
	{label: "Harvester", value: func(o plan.OptionCost, _ scenario.Scenario) string {
		if o.Harvester == scenario.HarvestNone {
			return "none"
		}
		return fmt.Sprintf("%s %s cm²", o.Harvester, FormatNumber(o.HarvesterAreaCm2))
	}},
	{label: "Lasts", strong: true, rule: true, value: func(o plan.OptionCost, _ scenario.Scenario) string { return o.Lifetime }},
	{label: "Flat on", value: func(o plan.OptionCost, _ scenario.Scenario) string { return orText(o.FirstBrownout, "after the plan") }},
	{label: "Swaps", value: func(o plan.OptionCost, _ scenario.Scenario) string { return fmt.Sprint(o.Swaps) }},
	{label: "First swap", value: func(o plan.OptionCost, _ scenario.Scenario) string { return orText(o.FirstSwap, "none") }},
	{label: "Brown-out", value: func(o plan.OptionCost, _ scenario.Scenario) string {
		return FormatNumber(o.BrownoutHours) + " h"
	}},
	{label: "Cells cost", rule: true, value: money(func(o plan.OptionCost) float64 { return o.CostCells })},
	{label: "Harvester cost", value: money(func(o plan.OptionCost) float64 { return o.CostHarvester })},
	{label: "Visits cost", value: money(func(o plan.OptionCost) float64 { return o.CostVisits })},
	{label: "Total cost", strong: true, value: money(func(o plan.OptionCost) float64 { return o.CostTotal })},
	{label: "Cost a year", value: money(func(o plan.OptionCost) float64 { return o.CostPerYear })},
	{label: "Cautions", rule: true, value: func(o plan.OptionCost, _ scenario.Scenario) string {
		if len(o.Cautions) == 0 {
			return "none"
		}
		return fmt.Sprint(len(o.Cautions))
	}},
}

func money(f func(plan.OptionCost) float64) func(plan.OptionCost, scenario.Scenario) string {
	return func(o plan.OptionCost, s scenario.Scenario) string { return plan.FormatMoney(f(o), s.Cost.Currency) }
}

func orText(p *string, none string) string {
	if p == nil {
		return none
	}
	return *p
}

// choiceLabel is the label the form shows for a choice's value in s.
func choiceLabel(s scenario.Scenario, path string) string {
	v := valueText(s, path)
	for _, o := range optionsFor(s, path) {
		if o.Value == v {
			return o.Label
		}
	}
	return v
}

// Options view geometry, CSS px.
const (
	optRowH      = 20
	optHeadGap   = 8
	optLabelMin  = 96  // the label column's least width
	optColGap    = 16  // between value columns
	smallButtonH = 24  // the buttons inside the view
	optHintW     = 560 // the widest the explaining text runs
	optColMax    = 200 // the widest an option's column grows: values stay near their labels
)

// optionsView is the options view laid out.
type optionsView struct {
	list    displayList
	Buttons []Button // keep, back, and each kept option's edit and remove
	Panel   Rect
	Columns []Rect // each option's column, kept ones first, from head to last row
	Problem string // why the options cannot be compared, or ""
}

// layoutOptions lays out the options view in r: a head with its actions,
// the table of options, then the comparison's sentences or why the options
// cannot be compared.
func layoutOptions(r Rect, c OptionsContent, m Measurer, th Theme) optionsView {
	var v optionsView
	d := &v.list
	boxAt := len(d.boxes)
	in := r.Inset(panelPad)
	caps, body, small := th.headStyle(), th.bodyStyle(), th.labelStyle()
	strong := TextStyle{Medium, th.Type.Body}
	costs, cmp, err := c.compare()

	// The head: what this is, and its actions at the right.
	y := in.Y
	title := d.text(m, "OPTIONS", caps, in.X, y+(smallButtonH-caps.LineHeight())/2, AlignLeft, roleSecondary)
	right := in.Right()
	addButton := func(id, label string, enabled bool, y float64) Rect {
		w := m.Advance(label, small) + 2*buttonPadX
		b := Button{ID: id, Label: label, At: Rect{right - w, y, w, smallButtonH}, Enabled: enabled}
		v.Buttons = append(v.Buttons, b)
		right = b.At.X - buttonGap
		return b.At
	}
	addButton("options", "Back to the chart", true, y)
	keep := addButton("keep", "Keep as an option", len(c.Kept) < maxKept, y)
	if len(c.Kept) >= maxKept {
		full := d.text(m, fmt.Sprintf("at most %d options: remove one to keep another", plan.MaxOptions), small,
			keep.X-12, y+(smallButtonH-small.LineHeight())/2, AlignRight, roleSecondary)
		right = full.Bounds().X - 12 + buttonGap
	}
	// What the numbers cover, beside the title when it fits.
	over := fmt.Sprintf("over the %d-year plan, costs in %s", c.Current.Plan.Years, c.Current.Cost.Currency)
	if x := title.Bounds().Right() + 12; x+m.Advance(over, small)+12 <= right-buttonGap {
		d.text(m, over, small, x, y+(smallButtonH-small.LineHeight())/2, AlignLeft, roleSecondary)
		y += smallButtonH + optHeadGap
	} else {
		y += smallButtonH + 4
		d.text(m, over, small, in.X, y, AlignLeft, roleSecondary)
		y += small.LineHeight() + optHeadGap
	}
	if len(c.Kept) == 0 {
		hint := "Keep the scenario as an option, then change an input on the left: " +
			"the option and the scenario you are editing are set side by side here, up to four."
		for _, l := range Wrap(m, hint, body, min(in.W, optHintW)) {
			d.text(m, l, body, in.X, y, AlignLeft, roleSecondary)
			y += body.LineHeight()
		}
		y += optHeadGap
	}

	// The table: a label column, then one column per option, values
	// right-aligned under their heads.
	labelW := float64(optLabelMin)
	for _, row := range optionRows {
		labelW = max(labelW, m.Advance(row.label, small)+optColGap)
	}
	n := len(costs)
	colW := min((in.W-labelW-float64(n-1)*optColGap)/float64(n), optColMax)
	colX := func(i int) float64 { return in.X + labelW + float64(i)*(colW+optColGap) }
	scens := make([]scenario.Scenario, n)
	for i, k := range c.Kept {
		scens[i] = k.Scen
	}
	scens[n-1] = c.Current
	cheap, long := map[string]bool{}, map[string]bool{}
	// What an option is best at, unless every option ties.
	if err == nil && n >= plan.MinOptions {
		for _, s := range cmp.Cheapest {
			cheap[s] = len(cmp.Cheapest) < n
		}
		for _, s := range cmp.LongestLasting {
			long[s] = len(cmp.LongestLasting) < n
		}
	}

	// Heads: the name, how it differs or that it is being edited, what it
	// is best at, and for a kept option its buttons.
	top := y
	headH := 0.0
	for i, o := range costs {
		x, hy := colX(i), y
		d.text(m, Elide(m, o.Name, strong, colW), strong, x+colW, hy, AlignRight, roleInk)
		hy += strong.LineHeight()
		note := "being edited"
		if i < len(c.Kept) {
			note = differences(c.Kept[i].Scen, c.Current)
		}
		lines := Wrap(m, note, small, colW)
		if len(lines) > 3 {
			lines = append(lines[:2], Elide(m, strings.Join(lines[2:], " "), small, colW))
		}
		for _, l := range lines {
			d.text(m, l, small, x+colW, hy, AlignRight, roleSecondary)
			hy += small.LineHeight()
		}
		var best []string
		if cheap[o.Name] {
			best = append(best, "cheapest")
		}
		if long[o.Name] {
			best = append(best, "lasts longest")
		}
		if len(best) > 0 {
			d.text(m, Elide(m, strings.Join(best, " · "), small, colW), small, x+colW, hy, AlignRight, roleMean)
			hy += small.LineHeight()
		}
		headH = max(headH, hy-y)
	}
	y += headH + 6
	for i := range c.Kept {
		right = colX(i) + colW
		addButton(fmt.Sprintf("option-remove-%d", i), "Remove", true, y)
		addButton(fmt.Sprintf("option-edit-%d", i), "Edit", true, y)
	}
	if len(c.Kept) > 0 {
		y += smallButtonH + 6
	}

	// The rows.
	for _, row := range optionRows {
		if row.rule {
			d.box(Rect{in.X, y + 3, colX(n-1) + colW - in.X, 1}, roleRule)
			y += 8
		}
		st := body
		if row.strong {
			st = strong
		}
		ly := y + (optRowH-small.LineHeight())/2
		d.text(m, row.label, small, in.X, ly, AlignLeft, roleSecondary)
		vy := y + (optRowH-st.LineHeight())/2
		for i, o := range costs {
			d.text(m, Elide(m, row.value(o, scens[i]), st, colW), st, colX(i)+colW, vy, AlignRight, roleInk)
		}
		y += optRowH
	}
	for i := range costs {
		v.Columns = append(v.Columns, Rect{colX(i), top, colW, y - top})
	}
	y += optHeadGap

	// The comparison in sentences, or why there is none.
	var sentences []string
	switch {
	case err != nil:
		v.Problem = compareProblem(err)
		sentences = []string{v.Problem}
	case n >= plan.MinOptions:
		sentences = cmp.Summary
	}
	role := roleInk
	if err != nil {
		role = roleFlat
	}
	for _, s := range sentences {
		for _, l := range Wrap(m, s, body, in.W) {
			d.text(m, l, body, in.X, y, AlignLeft, role)
			y += body.LineHeight()
		}
		y += 4
	}
	y += 4
	note := "Costs are straight sums (cells, harvester, visits), not discounted. Edit an option to read its cautions."
	for _, l := range Wrap(m, note, small, in.W) {
		d.text(m, l, small, in.X, y, AlignLeft, roleSecondary)
		y += small.LineHeight()
	}
	// The panel is as tall as its content, at most r.
	v.Panel = Rect{r.X, r.Y, r.W, min(y+panelPad-r.Y, r.H)}
	underPanel(d, boxAt, v.Panel)
	return v
}

// comparisonSummary is the comparison in sentences for the page's text
// mirror, or "" when there is nothing to compare.
func comparisonSummary(c OptionsContent) string {
	if len(c.Kept) == 0 {
		return ""
	}
	_, cmp, err := c.compare()
	if err != nil {
		return compareProblem(err)
	}
	return "Options: " + strings.Join(cmp.Summary, " ")
}

// optionsContent is the options view's content now. Call with a.mu held.
func (a *App) optionsContent() OptionsContent {
	return OptionsContent{Kept: a.kept, Current: a.scen, CurrentRes: a.res}
}

// keep keeps the scenario being edited as an option, unless it is kept
// already or there is no room. Call with a.mu held.
func (a *App) keep() {
	for _, k := range a.kept {
		if bytes.Equal(k.Scen.JSON(), a.scen.JSON()) {
			a.setNotice(fmt.Sprintf("This scenario is kept already, as %s. Change an input to make a different one.", k.Name()), false)
			return
		}
	}
	l := nextLetter(a.kept)
	if l == "" || len(a.kept) >= maxKept {
		return
	}
	a.kept = append(a.kept, keptOption{Letter: l, Scen: a.scen, Res: a.res})
	a.showOpts = true
	a.notice, a.noticeErr = "", false
	a.changed()
	a.keepOptions()
	a.layout()
}

// removeKept lets kept option i go. Call with a.mu held.
func (a *App) removeKept(i int) {
	if i < 0 || i >= len(a.kept) {
		return
	}
	a.kept = append(a.kept[:i:i], a.kept[i+1:]...)
	a.changed()
	a.keepOptions()
	a.layout()
}

// editKept makes kept option i the scenario being edited; the scenario that
// was being edited takes its place and letter, so nothing is lost, and Undo
// goes back to it in the inputs. Call with a.mu held.
func (a *App) editKept(i int) {
	if i < 0 || i >= len(a.kept) || a.drag.active || a.form.Dragging() {
		return
	}
	k := a.kept[i]
	a.kept[i] = keptOption{Letter: k.Letter, Scen: a.scen, Res: a.res}
	a.keepOptions()
	a.redraw.commit(time.Now())
	a.notice, a.noticeErr = fmt.Sprintf("Editing what was %s; the scenario you were editing is now %s.", k.Name(), k.Name()), false
	a.replace(k.Scen, k.Res)
}

// exportOptions offers the comparison as a JSON file, the same format as
// `nodelife compare --json`, or says why there is none. Call with a.mu held.
func (a *App) exportOptions() {
	_, cmp, err := a.optionsContent().compare()
	switch {
	case err != nil:
		a.setNotice(compareProblem(err), true)
	case len(a.kept) == 0:
		a.setNotice("Keep an option first: the comparison needs two.", false)
	default:
		data, err := json.MarshalIndent(cmp, "", "  ")
		if err != nil {
			panic("ui: comparison does not marshal: " + err.Error())
		}
		a.download(fileName(a.scen.Name, "-options.json"), "application/json", append(data, '\n'))
	}
}

// keptFormat names the kept options' format in the page's storage.
const keptFormat = "nodelife.options/1"

// keptFile is the kept options as the page keeps them between visits: each
// option's letter and scenario file (its result is planned again).
type keptFile struct {
	Format  string      `json:"format"`
	Options []keptEntry `json:"options"`
}

// keptEntry is one kept option in a keptFile.
type keptEntry struct {
	Letter   string          `json:"letter"`
	Scenario json.RawMessage `json:"scenario"`
}

// keepOptions hands the kept options to the page for the next visit. Call
// with a.mu held.
func (a *App) keepOptions() {
	if a.host == nil {
		return
	}
	var data []byte
	if len(a.kept) > 0 {
		f := keptFile{Format: keptFormat}
		for _, k := range a.kept {
			f.Options = append(f.Options, keptEntry{k.Letter, k.Scen.JSON()})
		}
		var err error
		if data, err = json.Marshal(f); err != nil {
			panic("ui: kept options do not marshal: " + err.Error())
		}
	}
	a.outbox = append(a.outbox, func() { a.host.KeepOptions(data) })
}

// restoreOptions plans again the options kept at the last visit. Any that
// no longer opens (a scenario the engine now refuses, a weather file the
// page does not have) is left out and named in the notice, with why. Call
// with a.mu held, before the current scenario is set.
func (a *App) restoreOptions(data []byte) {
	if len(data) == 0 {
		return
	}
	var f keptFile
	if err := json.Unmarshal(data, &f); err != nil || f.Format != keptFormat {
		why := fmt.Sprintf("format is not %s", keptFormat)
		if err != nil {
			why = err.Error()
		}
		a.addNotice("The options kept in this browser could not be read, so none are shown ("+why+").", true)
		return
	}
	var lost []string
	for i, o := range f.Options {
		name := fmt.Sprintf("option %d", i+1)
		switch {
		case len(a.kept) >= maxKept:
			lost = append(lost, name+" (at most "+fmt.Sprint(plan.MaxOptions)+" options)")
			continue
		case len(o.Letter) != 1 || !strings.Contains(nextLetters(a.kept), o.Letter):
			lost = append(lost, fmt.Sprintf("%s (letter %q; allowed: A, B or C, once each)", name, o.Letter))
			continue
		}
		name = "option " + o.Letter
		s, err := scenario.Parse(o.Scenario)
		var r plan.Result
		if err == nil {
			r, err = a.run(s)
		}
		if err != nil {
			lost = append(lost, fmt.Sprintf("%s (%v)", name, err))
			continue
		}
		a.kept = append(a.kept, keptOption{Letter: o.Letter, Scen: s, Res: r})
	}
	if len(lost) > 0 {
		a.addNotice("Some options kept in this browser could not be opened and are left out: "+strings.Join(lost, "; ")+".", true)
	}
}

// nextLetters are the letters no kept option has, in order.
func nextLetters(kept []keptOption) string {
	var b strings.Builder
	for _, l := range []string{"A", "B", "C"} {
		free := true
		for _, k := range kept {
			free = free && k.Letter != l
		}
		if free {
			b.WriteString(l)
		}
	}
	return b.String()
}

// addNotice adds a sentence to the notice across the page, a problem if
// either is. Call with a.mu held.
func (a *App) addNotice(msg string, isErr bool) {
	if a.notice != "" {
		msg = a.notice + " " + msg
	}
	a.notice, a.noticeErr = msg, isErr || a.noticeErr
}

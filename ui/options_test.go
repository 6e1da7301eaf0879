package ui

import (
	"fmt"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"nodelife/engine/plan"
	"nodelife/engine/scenario"
)

// typeInto gives the input at path a typed value and applies it.
func typeInto(t *testing.T, a *App, path, value string) {
	t.Helper()
	tabTo(t, a, path)
	a.step(chars(value))
	a.step(keys(KeyEnter))
	require.Empty(t, a.Debug().Errors[path], "typing %s into %s", value, path)
}

// button clicks the enabled button id, failing when there is none.
func button(t *testing.T, a *App, id string) {
	t.Helper()
	r, ok := a.Debug().Buttons[id]
	require.True(t, ok, "no enabled button %q; have %v", id, a.Debug().Buttons)
	x, y := center(r)
	tick(a, press(x, y))
	tick(a, release(x, y))
}

// optionTexts are the options view's texts, joined.
func optionTexts(a *App) string {
	if a.page.options == nil {
		return ""
	}
	return joined(&a.page.options.list)
}

func TestAppOptionsKeepEditCompare(t *testing.T) {
	a, h := newHosted(t)
	button(t, a, "options")
	assert.Equal(t, []string{currentName}, a.Debug().Options, "the view opens with the current scenario alone")
	assert.Contains(t, optionTexts(a), "Keep the scenario as an option")

	// Keep the demo (5 fps), then try 10 fps.
	button(t, a, "keep")
	typeInto(t, a, "node.vision.fps", "10")
	d := a.Debug()
	require.Equal(t, []string{"Option A", currentName}, d.Options)
	assert.Empty(t, d.OptionsProblem)
	texts := optionTexts(a)
	assert.Contains(t, texts, "Frame rate 5 fps", "option A says how it differs from the current scenario")
	// Twice the frames cost more energy: the kept 5 fps lasts longest and,
	// with fewer swaps, costs less (the demo's visits are the dearest item).
	kept, cur := a.kept[0].Res, a.res
	require.NotNil(t, kept.LifetimeDays)
	require.NotNil(t, cur.LifetimeDays)
	assert.Greater(t, *kept.LifetimeDays, *cur.LifetimeDays)
	assert.Contains(t, texts, `"Option A" lasts longest`)
	for _, want := range []string{kept.Lifetime, cur.Lifetime, "lasts longest"} {
		assert.Contains(t, texts, want)
	}
	// The page's text mirror carries the comparison too.
	assert.Contains(t, h.summaries[len(h.summaries)-1], `Options: `)

	// Keeping the same scenario twice is refused with a word why.
	button(t, a, "keep")
	button(t, a, "keep")
	assert.Contains(t, a.Debug().Notice, "kept already, as Option B")
	assert.Equal(t, []string{"Option A", "Option B", currentName}, a.Debug().Options)

	// Edit option A: it becomes the current scenario, and what was being
	// edited takes its place; Undo goes back to it in the inputs.
	button(t, a, "option-edit-0")
	assert.Equal(t, "5", a.Debug().Values["node.vision.fps"])
	assert.Equal(t, 10.0, a.kept[0].Scen.Node.Vision.FPS)
	assert.Contains(t, a.Debug().Notice, "Option A")
	tick(a, keys(KeyUndo))
	assert.Equal(t, "10", a.Debug().Values["node.vision.fps"])

	// Remove one; the letters of the rest stay.
	button(t, a, "option-remove-0")
	assert.Equal(t, []string{"Option B", currentName}, a.Debug().Options)
	typeInto(t, a, "node.vision.fps", "7")
	button(t, a, "keep")
	assert.Equal(t, []string{"Option B", "Option A", currentName}, a.Debug().Options, "the free letter is used again")

	// Back to the chart: the view goes, the options stay.
	button(t, a, "options")
	assert.Nil(t, a.Debug().Options)
	assert.Equal(t, 2, len(a.kept))
}

func TestAppOptionsAtMostFour(t *testing.T) {
	a, _ := newHosted(t)
	button(t, a, "options")
	for i, fps := range []string{"2", "3", "4"} {
		button(t, a, "keep")
		typeInto(t, a, "node.vision.fps", fps)
		require.Len(t, a.Debug().Options, i+2)
	}
	_, ok := a.Debug().Buttons["keep"]
	assert.False(t, ok, "a fifth option cannot be kept")
	assert.Contains(t, optionTexts(a), fmt.Sprintf("at most %d options", plan.MaxOptions))
	assert.Len(t, a.Debug().Options, plan.MaxOptions)
}

func TestAppOptionsThatCannotBeCompared(t *testing.T) {
	a, _ := newHosted(t)
	button(t, a, "options")
	button(t, a, "keep")
	typeInto(t, a, "plan.years", "5")
	d := a.Debug()
	assert.Contains(t, d.OptionsProblem, "plan.years", "the problem names the field")
	assert.Contains(t, d.OptionsProblem, "one horizon for every option", "… and what is allowed")
	assert.Contains(t, optionTexts(a), "cannot be compared")
	// The export says so instead of offering a file.
	a.mu.Lock()
	a.act("export-options")
	a.mu.Unlock()
	assert.Contains(t, a.Debug().Notice, "plan.years")
}

func TestAppOptionsExport(t *testing.T) {
	a, h := newHosted(t)
	a.mu.Lock()
	a.act("export")
	a.mu.Unlock()
	_, offered := a.Debug().Menu["export-options"]
	assert.False(t, offered, "no options to export before one is kept")
	tick(a, keys(KeyEscape))

	button(t, a, "options")
	button(t, a, "keep")
	typeInto(t, a, "cells.parallel", "2")
	button(t, a, "export")
	require.Contains(t, a.Debug().Menu, "export-options")
	click(a, a.Debug().Menu["export-options"])
	a.mu.Lock()
	a.flush()
	require.NotEmpty(t, h.downloads)
	got := h.downloads[len(h.downloads)-1]
	assert.True(t, strings.HasPrefix(got, "brindle-market-grünerløkka-store-shelf-watcher-aisle-4-options.json: "), got)
	assert.Contains(t, got, `"format": "`+plan.ComparisonFormat)
}

// TestOptionsLayoutFits lays the view out with four options, one of them
// with a harvester and long names, in every window the page must work in:
// every text inside the panel, none over another or over a button, and the
// panel inside the screen above the footer.
func TestOptionsLayoutFits(t *testing.T) {
	demo := scenario.Demo()
	r, err := plan.Run(demo)
	require.NoError(t, err)
	panel := demo
	panel.Site.Placement = scenario.Outdoor
	panel.Harvest.Kind = scenario.HarvestPanel
	panel.Cells.Parallel = 4
	rp, err := plan.Run(panel)
	require.NoError(t, err)
	c := OptionsContent{
		Kept:    []keptOption{{"A", panel, rp}, {"B", demo, r}, {"C", panel, rp}},
		Current: demo, CurrentRes: r,
	}
	for _, sz := range screenSizes {
		at := fmt.Sprintf("%gx%g", sz[0], sz[1])
		pg := LayoutPage(sz[0], sz[1], PageContent{Name: demo.Name, Result: r, Options: &c}, fonts(t), Light(), 1)
		require.NotNil(t, pg.options, at)
		v := pg.options
		assert.True(t, v.Panel.Within(Rect{0, pg.Header.Bottom(), sz[0], pg.Footer.Y - pg.Header.Bottom()}), "%s: panel %v", at, v.Panel)
		checkTexts(t, at+" options", &v.list, v.Panel.Inset(panelPad-1))
		for _, b := range v.Buttons {
			assert.True(t, b.At.Within(v.Panel), "%s: button %s at %v leaves the panel", at, b.ID, b.At)
			for _, tx := range v.list.texts {
				assert.False(t, tx.Bounds().Overlaps(b.At), "%s: button %s covers %q", at, b.ID, tx.s)
			}
		}
		require.Len(t, v.Columns, 4, at)
		for i := 1; i < len(v.Columns); i++ {
			assert.Greater(t, v.Columns[i].X, v.Columns[i-1].Right(), "%s: columns %d and %d touch", at, i-1, i)
		}
		bottom := 0.0
		for _, tx := range v.list.texts {
			bottom = max(bottom, tx.Bounds().Bottom())
			assert.False(t, strings.HasSuffix(tx.s, "…") && strings.ContainsAny(tx.s, "0123456789") && !strings.Contains(tx.s, ";"),
				"%s: a value is cut short: %q", at, tx.s)
		}
		assert.LessOrEqual(t, bottom, v.Panel.Bottom()-panelPad+1, "%s: the view's text runs out of its panel", at)
		if sz[0] < WideMin {
			assert.True(t, pg.Form.Empty(), "%s: the narrow options view takes the inputs' place", at)
		} else {
			assert.False(t, pg.Form.Empty(), "%s: the inputs stay beside the options", at)
		}
	}
}

func TestDifferences(t *testing.T) {
	a := scenario.Demo()
	b := a
	assert.Equal(t, "the same as Current", differences(a, b))
	b.Node.Vision.FPS = 10
	b.Cells.Parallel = 3
	assert.Equal(t, "Frame rate 5 fps; In parallel 1", differences(a, b))
	b.Plan.ReservePct = 20
	b.Plan.Years = 3
	assert.Equal(t, "Frame rate 5 fps; In parallel 1; Plan length 8 y; 1 more", differences(a, b))
	c := a
	c.Name = "another name"
	assert.Equal(t, "other settings differ from Current", differences(a, c))
}

func TestAppCostInputs(t *testing.T) {
	a, _ := newHosted(t)
	d := a.Debug()
	require.Contains(t, d.Values, "cost.cell")
	assert.NotContains(t, d.Values, "cost.panel", "no harvester, no harvester costs")
	assert.Equal(t, "EUR", d.Values["cost.currency"])
	assert.Equal(t, "EUR", a.form.Row("cost.visit").Text.Unit)

	// A dearer cell shows in the options' costs.
	button(t, a, "options")
	button(t, a, "keep")
	typeInto(t, a, "cost.cell", "20")
	_, cmp, err := a.optionsContent().compare()
	require.NoError(t, err)
	cells := float64(a.scen.Cells.Series * a.scen.Cells.Parallel * (1 + len(a.res.Swaps)))
	assert.InDelta(t, 20*cells, cmp.Options[1].CostCells, 1e-9)
	assert.InDelta(t, 9*cells, cmp.Options[0].CostCells, 1e-9, "the kept option keeps its price")

	// Another currency: the units follow, and the options can no longer
	// be compared (the kept one is in EUR).
	tabTo(t, a, "cost.currency")
	a.step(keys(KeyEnter))
	click(a, a.Debug().List.Items["USD"])
	assert.Equal(t, "USD", a.scen.Cost.Currency)
	assert.Equal(t, "USD", a.form.Row("cost.cell").Text.Unit)
	assert.Contains(t, a.Debug().OptionsProblem, "cost.currency")

	// A panel brings its costs, in the currency per cm² too.
	tabTo(t, a, "harvest.kind")
	a.step(keys(KeyDown))
	require.NotEqual(t, scenario.HarvestNone, a.scen.Harvest.Kind)
	assert.Equal(t, "USD/cm²", a.form.Row("cost.panel_per_cm2").Text.Unit)

	// A currency the list lacks, from a file, is offered as it is.
	s := scenario.Demo()
	s.Cost.Currency = "ISK"
	opts := optionsFor(s, "cost.currency")
	assert.Equal(t, "ISK", opts[len(opts)-1].Value)
}

func TestAppOptionsKeptForTheNextVisit(t *testing.T) {
	a, h := newHosted(t)
	button(t, a, "options")
	button(t, a, "keep")
	typeInto(t, a, "node.vision.fps", "2")
	button(t, a, "keep")
	typeInto(t, a, "node.vision.fps", "8")
	require.NotEmpty(t, h.options)
	saved := h.options[len(h.options)-1]
	assert.Contains(t, saved, `"format":"`+keptFormat+`"`)

	// The next visit plans them again, letters and all.
	h2 := &host{}
	b, err := New(Options{Host: h2, Scenario: a.ScenarioJSON(), KeptOptions: []byte(saved)})
	require.NoError(t, err)
	b.resize(1280, 720, 1)
	require.Len(t, b.kept, 2)
	for i, k := range b.kept {
		assert.Equal(t, a.kept[i].Letter, k.Letter)
		assert.Equal(t, string(a.kept[i].Scen.JSON()), string(k.Scen.JSON()))
		assert.Equal(t, a.kept[i].Res.Lifetime, k.Res.Lifetime)
	}
	assert.Empty(t, b.Debug().Notice)

	// Removing the last one forgets them.
	button(t, a, "option-remove-1")
	button(t, a, "option-remove-0")
	assert.Equal(t, "", h.options[len(h.options)-1])
}

func TestAppOptionsKeptButBroken(t *testing.T) {
	good := scenario.Demo()
	good.Node.Vision.FPS = 3
	bad := strings.Replace(string(good.JSON()), `"form": "D"`, `"form": "9V"`, 1)
	require.NotEqual(t, string(good.JSON()), bad, "the test needs a bad scenario")
	kept := fmt.Sprintf(`{"format":%q,"options":[{"letter":"B","scenario":%s},{"letter":"A","scenario":%s},{"letter":"B","scenario":%s}]}`,
		keptFormat, good.JSON(), bad, good.JSON())
	a, err := New(Options{KeptOptions: []byte(kept)})
	require.NoError(t, err)
	require.Len(t, a.kept, 1)
	assert.Equal(t, "B", a.kept[0].Letter)
	n := a.Debug().Notice
	assert.Contains(t, n, "option A (cells.form")
	assert.Contains(t, n, `option 3 (letter "B"; allowed: A, B or C, once each)`)

	b, err := New(Options{KeptOptions: []byte(`{"format": "something else"}`)})
	require.NoError(t, err)
	assert.Empty(t, b.kept)
	assert.Contains(t, b.Debug().Notice, "could not be read")
}

package ui

import (
	"slices"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"nodelife/engine/cell"
	"nodelife/engine/climate"
	"nodelife/engine/scenario"
)

// helpCase is a scenario named for the variant of the form it shows.
type helpCase struct {
	name string
	s    scenario.Scenario
}

// helpCases are scenarios that between them show every help text the form
// has: each placement, climate preset (and none), node profile (and
// custom), radio, chemistry with each of its form factors at the rated
// capacity, a typed capacity, each harvester, and a weather file.
func helpCases() []helpCase {
	var cs []helpCase
	add := func(name string, change func(*scenario.Scenario)) {
		s := scenario.Demo()
		change(&s)
		cs = append(cs, helpCase{name, s})
	}
	add("demo", func(*scenario.Scenario) {})
	for _, pl := range []string{scenario.Outdoor, scenario.Indoor, scenario.Fixed} {
		add("placement "+pl, func(s *scenario.Scenario) { s.Site.Placement = pl })
	}
	add("climate none", func(s *scenario.Scenario) { s.Site.Placement, s.Site.Climate.Preset = scenario.Outdoor, "none" })
	for _, p := range climate.Presets() {
		add("climate "+p.ID, func(s *scenario.Scenario) { s.Site.Placement, s.Site.Climate.Preset = scenario.Outdoor, p.ID })
	}
	add("profile custom", func(s *scenario.Scenario) { s.Node.Profile = "custom" })
	for _, id := range scenario.ProfileIDs() {
		add("profile "+id, func(s *scenario.Scenario) { scenario.ApplyProfile(s, id) })
	}
	radio, _ := scenario.FieldByPath("node.radio.class")
	for _, id := range radio.Enum {
		add("radio "+id, func(s *scenario.Scenario) { s.Node.Radio.Class = id })
	}
	for _, c := range cell.Library() {
		for _, f := range c.Forms {
			add("cells "+c.ID+" "+f.Name, func(s *scenario.Scenario) {
				s.Cells.Chemistry, s.Cells.Form, s.Cells.CapacityMAh = c.ID, f.Name, 0
			})
		}
	}
	add("typed capacity", func(s *scenario.Scenario) { s.Cells.CapacityMAh = 12000 })
	for _, k := range []string{scenario.HarvestNone, scenario.HarvestPanel, scenario.HarvestIndoor} {
		add("harvest "+k, func(s *scenario.Scenario) { s.Harvest.Kind = k })
	}
	add("weather file", func(s *scenario.Scenario) { s.Site.WeatherFile = "weather/a-long-station-name-tmy3.epw" })
	return cs
}

// helpViews are the form's column rectangles at the widths the page gives
// it: the narrow layout's, the wide layout's, and the two columns of a very
// wide window, each formColMin wide. Tall enough for every row.
var helpViews = []Rect{
	{16, 64, formNarrowW, 3000},
	{16, 64, formWideW, 3000},
	{16, 64, formTwoColW, 3000},
}

// helpScreen is a screen around v for the form's lists.
func helpScreen(v Rect) Rect { return Rect{0, 0, v.Right() + 600, v.Bottom() + 100} }

func TestHelpCasesShowEveryVariant(t *testing.T) {
	// The cases must reach every row the form can show, or the tests below
	// would pass on rows they never see.
	seen := map[string]bool{}
	for _, c := range helpCases() {
		for _, p := range paths(c.s) {
			seen[p] = true
		}
	}
	for _, p := range []string{
		"site.indoor_temp_c", "site.fixed_temp_c", "site.climate.preset", "site.outdoor_mean_c",
		"harvest.panel.area_cm2", "harvest.indoor.area_cm2",
	} {
		assert.True(t, seen[p], "no case shows %s", p)
	}
	// The two-column view does split the form, each column at the
	// narrowest width.
	f := NewForm(scenario.Demo())
	v := helpViews[2]
	f.Layout(v, helpScreen(v), fonts(t), Light())
	right := 0
	for _, r := range f.Rows {
		assert.Equal(t, float64(formColMin), r.Row.W, r.Path)
		if r.Row.X > v.X {
			right++
		}
	}
	assert.Positive(t, right, "the two-column view shows one column")
}

func TestHelpFitsOneLineUnfocused(t *testing.T) {
	m, small := fonts(t), Light().labelStyle()
	// Each help line that does not show whole, once, with a case that shows it.
	cut := map[string]string{}
	for _, c := range helpCases() {
		for _, v := range helpViews {
			f := NewForm(c.s)
			f.Layout(v, helpScreen(v), m, Light())
			for _, r := range f.Rows {
				require.Len(t, r.help, 1, "%s, %g px: %s", c.name, v.W, r.Path)
				line := r.HelpLine
				if r.help[0] != line || strings.HasSuffix(line, "…") || m.Advance(line, small) > r.Row.W {
					cut[r.Path+": "+line] = c.name
				}
			}
		}
	}
	assert.Empty(t, cut, "help lines cut in a %d px column", formColMin)
}

func TestHelpFocusedShowsTheFullText(t *testing.T) {
	m, small := fonts(t), Light().labelStyle()
	for _, c := range helpCases() {
		for _, v := range helpViews {
			f := NewForm(c.s)
			f.Layout(v, helpScreen(v), m, Light())
			for i, r := range f.Rows {
				f.focusOn(i)
				f.Layout(v, helpScreen(v), m, Light())
				full := r.Help
				require.NotEmpty(t, r.help, "%s: %s", c.name, r.Path)
				require.Equal(t, strings.Fields(full), strings.Fields(strings.Join(r.help, " ")),
					"%s, %g px: %s focused shows %q", c.name, v.W, r.Path, r.help)
				for _, l := range r.help {
					require.LessOrEqual(t, m.Advance(l, small), r.Row.W, "%s, %g px: %s line %q", c.name, v.W, r.Path, l)
				}
			}
		}
	}
}

func TestHelpFullTextIsTheEnginesWhereShortened(t *testing.T) {
	doc := func(path string) string {
		f, ok := scenario.FieldByPath(path)
		require.True(t, ok, path)
		return f.Doc
	}
	focused := func(s scenario.Scenario, path string) string {
		f := NewForm(s)
		v := helpViews[0]
		f.Layout(v, helpScreen(v), fonts(t), Light())
		r := f.Row(path)
		require.NotNil(t, r, path)
		f.focusOn(slices.Index(f.Rows, r))
		f.Layout(v, helpScreen(v), fonts(t), Light())
		return strings.Join(r.help, " ")
	}
	demo := scenario.Demo()
	// The engine's own description, word for word, for the inputs the app
	// gives a short line of their own.
	for _, path := range []string{"site.timezone", "site.placement", "node.radio.class", "harvest.kind", "plan.reserve_pct"} {
		assert.Equal(t, doc(path), focused(demo, path), path)
	}
	fixed := demo
	fixed.Site.Placement = scenario.Fixed
	assert.Equal(t, doc("site.fixed_temp_c"), focused(fixed, "site.fixed_temp_c"))
	none := demo
	none.Site.Placement, none.Site.Climate.Preset = scenario.Outdoor, "none"
	assert.Equal(t, doc("site.climate.preset"), focused(none, "site.climate.preset"))
	// The position keeps its paste hint.
	assert.Contains(t, focused(demo, pathPosition), `paste "59.91, 10.75"`)
	// Dynamic texts: the preset's and the profile's notes, the chemistry's
	// full name, where the rated capacity comes from.
	for _, p := range climate.Presets() {
		s := demo
		s.Site.Placement, s.Site.Climate.Preset = scenario.Outdoor, p.ID
		assert.Equal(t, p.Note, focused(s, "site.climate.preset"), p.ID)
	}
	for _, p := range scenario.Profiles() {
		s := demo
		scenario.ApplyProfile(&s, p.ID)
		assert.Contains(t, focused(s, "node.profile"), p.Note, p.ID)
	}
	for _, c := range cell.Library() {
		s := demo
		s.Cells.Chemistry, s.Cells.Form = c.ID, c.Forms[0].Name
		assert.Contains(t, focused(s, "cells.chemistry"), c.Name, c.ID)
		if c.Primary {
			assert.Contains(t, focused(s, "cells.chemistry"), "never charge", c.ID)
		}
	}
	assert.Equal(t, "rated capacity of one D cell; type a value to override", focused(demo, "cells.capacity_mah"))
}

func TestHelpLinesNameKnownInputs(t *testing.T) {
	// A short line for an input, profile, preset or chemistry that is gone
	// would never show.
	rows := map[string]bool{}
	for _, c := range helpCases() {
		for _, p := range paths(c.s) {
			rows[p] = true
		}
	}
	for path := range helpLines {
		assert.True(t, rows[path], "help line for %s, which no row shows", path)
	}
	for id := range profileLines {
		_, ok := scenario.LookupProfile(id)
		assert.True(t, ok, "help line for profile %s, which does not exist", id)
	}
	for id := range presetLines {
		_, ok := climate.LookupPreset(id)
		assert.True(t, ok, "help line for climate preset %s, which does not exist", id)
	}
	for id := range chemistryLines {
		_, ok := cell.Lookup(id)
		assert.True(t, ok, "help line for chemistry %s, which does not exist", id)
	}
}

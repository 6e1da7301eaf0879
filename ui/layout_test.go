package ui

import (
	"fmt"
	"strings"
	"testing"
)

// screenSizes are the windows the page must work in: common laptop and
// desktop sizes, both sides of WideMin, and a 760 px docs column.
var screenSizes = [][2]float64{
	{1280, 720}, {1366, 768}, {1920, 1080}, {2560, 1440},
	{1100, 720}, {1099, 720}, {900, 720}, {760, 720}, {760, 900},
}

func TestLayoutRegions(t *testing.T) {
	for _, sz := range screenSizes {
		a := newApp(t, sz[0], sz[1])
		pg := a.page
		wantMode := Wide
		if sz[0] < WideMin {
			wantMode = Narrow
		}
		if pg.Mode != wantMode {
			t.Errorf("%gx%g: mode %v, want %v", sz[0], sz[1], pg.Mode, wantMode)
		}
		regions := map[string]Rect{"header": pg.Header, "footer": pg.Footer, "form": pg.Form, "side": pg.Side}
		if pg.Mode == Wide {
			regions["chart"] = pg.Chart
		}
		for name, r := range regions {
			if r.Empty() || !r.Within(pg.Screen) {
				t.Errorf("%gx%g: %s %v is empty or leaves the screen", sz[0], sz[1], name, r)
			}
			for other, o := range regions {
				if name < other && r.Overlaps(o) {
					t.Errorf("%gx%g: %s %v overlaps %s %v", sz[0], sz[1], name, r, other, o)
				}
			}
		}
		// The blocks of the scrolling column follow each other, the
		// cautions straight after the answer (and the chart).
		blocks := []Rect{pg.Answer, pg.Cautions, pg.Advice, pg.Energy}
		if pg.Mode == Narrow {
			blocks = []Rect{pg.Answer, pg.Chart, pg.Cautions, pg.Advice, pg.Energy}
		}
		if pg.Mode == Wide && (pg.Cautions.Empty() || pg.Cautions.Bottom() > pg.Side.Bottom()) {
			t.Errorf("%gx%g: the cautions %v are not all in view in the column %v", sz[0], sz[1], pg.Cautions, pg.Side)
		}
		for i := 1; i < len(blocks); i++ {
			if blocks[i].Y < blocks[i-1].Bottom()+blockGap-0.5 || blocks[i].X != pg.Side.X {
				t.Errorf("%gx%g: block %d at %v does not follow %v", sz[0], sz[1], i, blocks[i], blocks[i-1])
			}
		}
		v := pg.chart
		if pg.Chart.H < minChartH || v.Plot.H < 120 || v.Plot.W < 300 {
			t.Errorf("%gx%g: chart %v, plot %v: too small to read", sz[0], sz[1], pg.Chart, v.Plot)
		}
		// The strip and the bars sit under the plot, on its time axis.
		if v.Strip.Empty() || v.Bars.Empty() {
			t.Errorf("%gx%g: strip %v bars %v: the chart has room for both", sz[0], sz[1], v.Strip, v.Bars)
			continue
		}
		if v.Strip.X != v.Plot.X || v.Strip.W != v.Plot.W || v.Strip.Y <= v.Plot.Bottom() || v.Bars.Y <= v.Strip.Bottom() ||
			!v.Bars.Within(pg.Chart) {
			t.Errorf("%gx%g: plot %v strip %v bars %v chart %v", sz[0], sz[1], v.Plot, v.Strip, v.Bars, pg.Chart)
		}
	}
}

// checkTexts fails for text outside its region or overlapping other text.
func checkTexts(t *testing.T, where string, d *displayList, region Rect) {
	t.Helper()
	for i, a := range d.texts {
		b := a.Bounds()
		if !b.Within(region) {
			t.Errorf("%s: %q at %v leaves %v", where, a.s, b, region)
		}
		for _, o := range d.texts[i+1:] {
			if b.Overlaps(o.Bounds()) {
				t.Errorf("%s: %q %v overlaps %q %v", where, a.s, b, o.s, o.Bounds())
			}
		}
	}
}

// column is the laid-out extent of the scrolling column's content.
func column(pg *Page) Rect {
	top := pg.Answer.Y
	bottom := max(pg.Energy.Bottom(), pg.Cautions.Bottom())
	return Rect{pg.Side.X, top, pg.Side.W, bottom - top}
}

func TestLayoutTextFitsAndDoesNotCollide(t *testing.T) {
	for _, sz := range screenSizes {
		a := newApp(t, sz[0], sz[1])
		pg := a.page
		at := fmt.Sprintf("%gx%g", sz[0], sz[1])
		checkTexts(t, at+" header", &pg.header, pg.Header)
		checkTexts(t, at+" footer", &pg.footer, pg.Footer)
		checkTexts(t, at+" side", &pg.side, column(&pg))
		checkTexts(t, at+" chart", &pg.chart.Labels, pg.Chart)
		// Nothing shortened that matters: the whole answer and every caution.
		side := joined(&pg.side)
		for _, want := range []string{"4 y 10 mo", "2032-01-12", "2031-07-04", "vision"} {
			if !strings.Contains(side, want) {
				t.Errorf("%s: side text %q lacks %q", at, side, want)
			}
		}
		for _, c := range a.res.Cautions {
			if !strings.Contains(side, c.Message) {
				t.Errorf("%s: caution %s cut short", at, c.Code)
			}
		}
		if !strings.Contains(joined(&pg.footer), "0 °C.") {
			t.Errorf("%s: the general caution is cut short: %q", at, joined(&pg.footer))
		}
		// The header's buttons fit and do not cover the names.
		for i, b := range pg.Buttons {
			if !b.At.Within(pg.Header) {
				t.Errorf("%s: button %s at %v leaves the header", at, b.ID, b.At)
			}
			if i > 0 && b.At.X < pg.Buttons[i-1].At.Right() {
				t.Errorf("%s: button %s overlaps %s", at, b.ID, pg.Buttons[i-1].ID)
			}
			for _, tx := range pg.header.texts {
				if tx.Bounds().Overlaps(b.At) {
					t.Errorf("%s: button %s covers %q", at, b.ID, tx.s)
				}
			}
		}
	}
}

func joined(d *displayList) string {
	var parts []string
	for _, t := range d.texts {
		parts = append(parts, t.s)
	}
	return strings.Join(parts, " ")
}

func TestLayoutFormInView(t *testing.T) {
	// At 1920×1080 every input shows without scrolling; in smaller windows
	// the column scrolls, but the first inputs are in view.
	a := newApp(t, 1920, 1080)
	if n := len(a.Debug().Fields); n != len(a.form.Rows) {
		t.Errorf("1920x1080: %d of %d inputs on screen (content %g px, column %g)", n, len(a.form.Rows), a.form.Content, a.form.View.H)
	}
	for _, sz := range [][2]float64{{1280, 720}, {760, 720}} {
		a = newApp(t, sz[0], sz[1])
		for _, p := range []string{"site.place", "site.position"} {
			if _, ok := a.Debug().Fields[p]; !ok {
				t.Errorf("%gx%g: %s is not on screen", sz[0], sz[1], p)
			}
		}
	}
}

func TestLayoutFollowsResize(t *testing.T) {
	a := newApp(t, 1280, 720)
	wide := a.Debug().Fields["site.position"]
	a.dirty = false
	a.resize(760, 900, 2)
	narrow := a.Debug().Fields["site.position"]
	if !a.dirty || a.page.Mode != Narrow {
		t.Errorf("resize: dirty %v mode %v; want a redraw in the narrow layout", a.dirty, a.page.Mode)
	}
	if narrow.Right() > 760 || narrow == wide {
		t.Errorf("position box %v after resizing to 760 px (was %v)", narrow, wide)
	}
}

func TestLayoutSideScrolls(t *testing.T) {
	a := newApp(t, 760, 720)
	pg := a.page
	if pg.SideContent <= pg.Side.H {
		t.Fatalf("the narrow column's content %g fits in %g: the test needs it taller", pg.SideContent, pg.Side.H)
	}
	x, y := center(pg.Side)
	top := pg.Answer.Y
	a.step(&Input{MouseX: x, MouseY: y, WheelY: -3})
	if a.page.Answer.Y != top-120 || a.page.SideScroll != 120 {
		t.Errorf("wheel 3 lines down: answer at %g (was %g), scroll %g; want 120 px up", a.page.Answer.Y, top, a.page.SideScroll)
	}
	a.step(&Input{MouseX: x, MouseY: y, WheelY: -1000})
	if want := pg.SideContent - pg.Side.H; a.page.SideScroll != want || a.page.Cautions.Bottom() > a.page.Side.Bottom()+0.5 {
		t.Errorf("wheel far down: scroll %g (want %g), cautions end at %g, column at %g", a.page.SideScroll, want, a.page.Cautions.Bottom(), a.page.Side.Bottom())
	}
}

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
		regions := map[string]Rect{"header": pg.Header, "footer": pg.Footer, "form": pg.Form,
			"chart": pg.Chart, "answer": pg.Answer, "cautions": pg.Cautions}
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
		if pg.Chart.H < minChartH || pg.chart.Plot.H < 100 || pg.chart.Plot.W < 300 {
			t.Errorf("%gx%g: chart %v, plot %v: too small to read", sz[0], sz[1], pg.Chart, pg.chart.Plot)
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

func TestLayoutTextFitsAndDoesNotCollide(t *testing.T) {
	for _, sz := range screenSizes {
		a := newApp(t, sz[0], sz[1])
		pg := a.page
		at := fmt.Sprintf("%gx%g", sz[0], sz[1])
		checkTexts(t, at+" header", &pg.header, pg.Header)
		checkTexts(t, at+" footer", &pg.footer, pg.Footer)
		checkTexts(t, at+" answer", &pg.answer, pg.Answer)
		checkTexts(t, at+" cautions", &pg.cautions, pg.Cautions)
		checkTexts(t, at+" chart", &pg.chart.Labels, pg.Chart)
		// Nothing shortened that matters: the whole answer and every caution.
		if !strings.Contains(joined(&pg.answer), "Lasts 4 y 10 mo") || !strings.Contains(joined(&pg.answer), "2032-01-12") {
			t.Errorf("%s: answer text %q lacks the lifetime or the flat date", at, joined(&pg.answer))
		}
		got := joined(&pg.cautions)
		for _, c := range a.res.Cautions {
			if !strings.Contains(got, c.Message) {
				t.Errorf("%s: caution %s cut short: %q", at, c.Code, got)
			}
		}
		if !strings.Contains(joined(&pg.footer), "0 °C.") {
			t.Errorf("%s: the general caution is cut short: %q", at, joined(&pg.footer))
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

func TestLayoutFormFitsAt720(t *testing.T) {
	// At 1280×720 every field shows without scrolling; at 760×720 the
	// column may scroll, but the first field is in view.
	a := newApp(t, 1280, 720)
	if a.form.Content > a.form.View.H {
		t.Errorf("1280x720: the fields need %g px, the column has %g", a.form.Content, a.form.View.H)
	}
	if n := len(a.Debug().Fields); n != len(a.form.Fields) {
		t.Errorf("1280x720: %d of %d fields on screen", n, len(a.form.Fields))
	}
	a = newApp(t, 760, 720)
	if _, ok := a.Debug().Fields["node.vision.fps"]; !ok {
		t.Error("760x720: the frame rate field is not on screen")
	}
}

func TestLayoutFollowsResize(t *testing.T) {
	a := newApp(t, 1280, 720)
	wide := a.Debug().Fields["node.vision.fps"]
	a.dirty = false
	a.resize(760, 900, 2)
	narrow := a.Debug().Fields["node.vision.fps"]
	if !a.dirty || a.page.Mode != Narrow {
		t.Errorf("resize: dirty %v mode %v; want a redraw in the narrow layout", a.dirty, a.page.Mode)
	}
	if narrow.Right() > 760 || narrow == wide {
		t.Errorf("fps box %v after resizing to 760 px (was %v)", narrow, wide)
	}
}

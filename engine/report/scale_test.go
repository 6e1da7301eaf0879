package report

import (
	"fmt"
	"math"
	"strconv"
	"strings"
	"testing"
	"time"
)

func TestNiceCeil(t *testing.T) {
	// Expected values follow from the list of steps in niceCeil's doc.
	for _, c := range []struct{ v, want float64 }{
		{0, 1}, {-3, 1}, {math.NaN(), 1}, {math.Inf(1), 1},
		{1, 1}, {1.08, 1.5}, {3, 3}, {3.0000001, 4}, {15.5, 20}, {35, 40}, {0.0042, 0.005}, {810, 1000},
	} {
		if got := niceCeil(c.v); math.Abs(got-c.want) > 1e-12*c.want {
			t.Errorf("niceCeil(%g) = %g, want %g", c.v, got, c.want)
		}
	}
}

func TestTempColour(t *testing.T) {
	// The ends and the neutral are UI.md's colours; beyond the ends the
	// colour saturates; halfway is the sRGB midpoint (rounded).
	for _, c := range []struct {
		c    float64
		want string
	}{
		{tempColdC, "#4B7BB5"}, {-40, "#4B7BB5"}, {tempMidC, "#E9E6DF"}, {tempHotC, "#C0563F"}, {90, "#C0563F"},
		{5, "#9AB1CA"}, // (0x4B+0xE9)/2 = 0x9A, (0x7B+0xE6)/2 = 0xB0.5 → 0xB1, (0xB5+0xDF)/2 = 0xCA
	} {
		if got := tempColour(c.c); got != c.want {
			t.Errorf("tempColour(%g) = %s, want %s", c.c, got, c.want)
		}
	}
}

func TestDateTicks(t *testing.T) {
	day := func(s string) time.Time {
		d, err := time.Parse(time.DateOnly, s)
		if err != nil {
			t.Fatal(err)
		}
		return d
	}
	for _, c := range []struct {
		name       string
		start, end string
		widthPx    float64
		want       []string
	}{
		// 8 years on 880 px: 110 px a year, so every year, and the start
		// named at the axis's left end: 2028 is 10 months (92 px) in.
		{"8 years", "2027-03-01", "2035-03-01", 880, []string{"Mar 2027", "2028", "2029", "2030", "2031", "2032", "2033", "2034", "2035"}},
		// 20 years on 880 px: 44 px a year is under minTickGapPx, so every
		// other year; 2028 is only 37 px in, so the start's tick replaces it.
		{"20 years", "2027-03-01", "2047-03-01", 880, []string{"Mar 2027", "2030", "2032", "2034", "2036", "2038", "2040", "2042", "2044", "2046"}},
		// 6 months on 880 px: every month, the first named with its year.
		{"6 months", "2027-03-01", "2027-09-01", 880, []string{"Mar 2027", "Apr", "May", "Jun", "Jul", "Aug", "Sep"}},
		// A start mid-month: the start is named, then the months' firsts.
		{"mid-month", "2027-03-15", "2027-06-15", 880, []string{"Mar 2027", "Apr", "May", "Jun"}},
		// A start on 1 January: its tick names the year, as every 1 January.
		{"from January", "2027-01-01", "2027-05-01", 880, []string{"2027", "Feb", "Mar", "Apr", "May"}},
	} {
		s := TimeScale{Start: day(c.start), End: day(c.end), X0: 0, X1: c.widthPx}
		var got []string
		for _, tk := range dateTicks(s, minTickGapPx) {
			got = append(got, tk.Label)
			if tk.Pos < 0 || tk.Pos > c.widthPx {
				t.Errorf("%s: tick %s at %g px, outside the axis", c.name, tk.Label, tk.Pos)
			}
		}
		if len(got) != len(c.want) {
			t.Errorf("%s: ticks %q, want %q", c.name, got, c.want)
			continue
		}
		for i := range got {
			if got[i] != c.want[i] {
				t.Errorf("%s: ticks %q, want %q", c.name, got, c.want)
				break
			}
		}
	}
	if ticks := dateTicks(TimeScale{Start: day("2027-01-01"), End: day("2027-01-01"), X1: 100}, minTickGapPx); ticks != nil {
		t.Errorf("an empty span has ticks %v", ticks)
	}
}

func TestFit(t *testing.T) {
	short := "Dock 4"
	if got := fit(short, titleSize, 500); got != short {
		t.Errorf("fit(%q) = %q, want it unchanged", short, got)
	}
	long := "Loading dock 4, north wall, above the roller door: people counter"
	got := fit(long, titleSize, 300)
	if strongWidth(got, titleSize) > 300 || got[len(got)-len("…"):] != "…" {
		t.Errorf("fit(%q, 300 px) = %q (%.0f px), want at most 300 px ending in …", long, got, strongWidth(got, titleSize))
	}
}

func TestFixedAndNumber(t *testing.T) {
	for _, c := range []struct {
		x    float64
		prec int
		want string
	}{{-0.0004, 3, "0.000"}, {-0.04, 1, "0.0"}, {-1.25, 1, "-1.2"}, {math.NaN(), 2, "NaN"}, {math.Inf(-1), 2, "-Inf"}} {
		if got := fixed(c.x, c.prec); got != c.want {
			t.Errorf("fixed(%g, %d) = %q, want %q", c.x, c.prec, got, c.want)
		}
	}
	for _, c := range []struct {
		v    float64
		want string
	}{{-10, "−10"}, {-0.001, "0"}, {1.5, "1.5"}, {20, "20"}, {0.125, "0.13"}} {
		if got := number(c.v); got != c.want {
			t.Errorf("number(%g) = %q, want %q", c.v, got, c.want)
		}
	}
}

func TestDateAxisNamesTheStartAndKeepsGaps(t *testing.T) {
	// Starts on a month's first, mid-month and on 1 January, horizons of
	// weeks to decades, on narrow and wide axes, with the SVG's label widths
	// and with labels far wider (10 px a character), which must be thinned.
	wide := func(s string) float64 { return 10 * float64(len([]rune(s))) }
	svg := func(s string) float64 { return textWidth(s, labelSize) }
	for _, start := range []time.Time{
		time.Date(2027, 3, 1, 0, 0, 0, 0, time.UTC),
		time.Date(2027, 3, 15, 0, 0, 0, 0, time.UTC),
		time.Date(2026, 12, 20, 0, 0, 0, 0, time.UTC),
		time.Date(2027, 1, 1, 0, 0, 0, 0, time.UTC),
	} {
		for _, months := range []int{1, 6, 18, 40, 96, 240} {
			for _, px := range []float64{300, 600, 880, 2000} {
				for wname, width := range map[string]func(string) float64{"svg": svg, "wide": wide} {
					s := TimeScale{Start: start, End: start.AddDate(0, months, 0), X0: 40, X1: 40 + px}
					name := fmt.Sprintf("%s +%d months on %g px, %s labels", start.Format(time.DateOnly), months, px, wname)
					ticks := DateAxis(s, minTickGapPx, width)
					if len(ticks) == 0 {
						t.Errorf("%s: no ticks", name)
						continue
					}
					// The first tick is the start, named with its year.
					if !ticks[0].At.Equal(s.Start) || ticks[0].Pos != s.X0 {
						t.Errorf("%s: first tick %s at %g, want the start at %g", name, ticks[0].At.Format(time.DateOnly), ticks[0].Pos, s.X0)
					}
					if !strings.Contains(ticks[0].Label, strconv.Itoa(start.Year())) {
						t.Errorf("%s: first label %q does not name %d", name, ticks[0].Label, start.Year())
					}
					// The other ticks are DateTicks' ones, minGapPx apart.
					plain := map[time.Time]bool{}
					for _, tk := range DateTicks(s, minTickGapPx) {
						plain[tk.At] = true
					}
					right := math.Inf(-1)
					for i, tk := range ticks {
						if i > 0 && !plain[tk.At] {
							t.Errorf("%s: tick %d on %s is not one of DateTicks'", name, i, tk.At.Format(time.DateOnly))
						}
						if i > 0 && tk.Pos-ticks[i-1].Pos < minTickGapPx {
							t.Errorf("%s: ticks %d and %d %g px apart", name, i-1, i, tk.Pos-ticks[i-1].Pos)
						}
						if tk.Label == "" {
							continue
						}
						// Labels placed as the charts place them never overlap.
						w := width(tk.Label)
						l := min(max(tk.Pos-w/2, s.X0), s.X1-w)
						if l < right+dateLabelGapPx {
							t.Errorf("%s: label %q at %g overlaps the one before (ends at %g)", name, tk.Label, l, right)
						}
						right = l + w
					}
				}
			}
		}
	}
}

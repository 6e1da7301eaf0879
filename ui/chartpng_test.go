package ui

import (
	"bytes"
	"image/png"
	"testing"
)

func TestChartPixels(t *testing.T) {
	for _, c := range []struct {
		r      Rect
		scale  float64
		wW, wH int
	}{
		{Rect{300, 60, 640, 480}, 1, 640, 480},
		{Rect{300, 60, 640, 480}, 2, 1280, 960},
		{Rect{12.5, 0, 640.25, 480.5}, 2, 1281, 961}, // the painter rounds edges to device pixels
		{Rect{0, 0, 333.4, 200.2}, 1.5, 500, 300},    // 500.1 and 300.3 round down
		{Rect{0, 0, 0, 200}, 2, 0, 400},              // no room: nothing to export
	} {
		if w, h := chartPixels(c.r, c.scale); w != c.wW || h != c.wH {
			t.Errorf("chartPixels(%v, %g) = %d × %d, want %d × %d", c.r, c.scale, w, h, c.wW, c.wH)
		}
	}
}

func TestEncodePNG(t *testing.T) {
	const w, h = 3, 2
	pix := make([]byte, 4*w*h)
	for i := range pix {
		pix[i] = byte(i * 10)
	}
	for i := 3; i < len(pix); i += 4 {
		pix[i] = 255 // opaque, as the chart is
	}
	data, err := encodePNG(pix, w, h)
	if err != nil {
		t.Fatal(err)
	}
	img, err := png.Decode(bytes.NewReader(data))
	if err != nil {
		t.Fatal(err)
	}
	if b := img.Bounds(); b.Dx() != w || b.Dy() != h {
		t.Fatalf("decoded %v, want %d × %d", b, w, h)
	}
	r, g, bl, _ := img.At(2, 1).RGBA()
	// Pixel (2, 1) starts at byte 4*(1*3+2) = 20: values 200, 210, 220.
	if r>>8 != 200 || g>>8 != 210 || bl>>8 != 220 {
		t.Errorf("pixel (2, 1) = %d %d %d, want 200 210 220", r>>8, g>>8, bl>>8)
	}
}

// The menu's PNG item asks the next Draw for the picture (painting needs the
// running game; the browser test checks the file itself).
func TestExportPNGAsksDraw(t *testing.T) {
	a, h := newHosted(t)
	click(a, a.Debug().Buttons["export"])
	menu := a.Debug().Menu
	if menu == nil {
		t.Fatal("the export button opened no menu")
	}
	x, y := center(menu["export-png"])
	tick(a, press(x, y))
	tick(a, release(x, y))
	if !a.wantPNG || !a.dirty || a.Debug().Menu != nil {
		t.Errorf("after Chart picture: wantPNG %v, dirty %v, menu %v; want a redraw asked and the menu closed", a.wantPNG, a.dirty, a.Debug().Menu)
	}
	if len(h.downloads) != 0 {
		t.Errorf("downloads before any Draw: %q", h.downloads)
	}
	if d := a.Debug(); d.Panel != a.page.Chart || d.Panel.Empty() {
		t.Errorf("Debug().Panel = %v, want the chart's panel %v", d.Panel, a.page.Chart)
	}
}

package ui

import (
	"bytes"
	"image"
	"image/png"
	"math"

	"github.com/hajimehoshi/ebiten/v2"
)

// The chart as a PNG: the export lays the chart out again at the origin, the
// size it has on screen, and paints it on an image of its own in device
// pixels, so the file is as sharp as the screen and carries no pointer
// read-out, open menu or scrolled-off part. Painting and reading pixels back
// need the running game, so the action only asks for it and the next Draw
// does it.

// chartPixels is the size in device pixels of a chart of r (CSS px) painted
// at scale: the painter's rounding of its right and bottom edges at the
// origin.
func chartPixels(r Rect, scale float64) (w, h int) {
	return int(math.Round(r.W * scale)), int(math.Round(r.H * scale))
}

// encodePNG encodes pixels (RGBA, premultiplied as ebiten reads them, and the
// chart is opaque) of a w × h image.
func encodePNG(pix []byte, w, h int) ([]byte, error) {
	img := &image.RGBA{Pix: pix, Stride: 4 * w, Rect: image.Rect(0, 0, w, h)}
	var buf bytes.Buffer
	if err := (&png.Encoder{CompressionLevel: png.BestSpeed}).Encode(&buf, img); err != nil {
		return nil, err
	}
	return buf.Bytes(), nil
}

// pendingPNG is the chart painted for export, to be read back.
type pendingPNG struct {
	img  *ebiten.Image
	w, h int
	name string
}

// paintChartPNG paints the chart alone on an image of its own, or says why
// it cannot and returns nil. Call from Draw with a.mu held.
func (a *App) paintChartPNG() *pendingPNG {
	r := a.page.Chart
	w, h := chartPixels(r, a.scale)
	if w <= 0 || h <= 0 {
		a.setNotice("The chart has no room on screen to export.", true)
		return nil
	}
	at := Rect{0, 0, r.W, r.H}
	v := layoutChart(at, a.res, a.scen.Plan.ReservePct, a.shortDays, a.fonts, a.theme, 1/a.scale)
	img := ebiten.NewImage(w, h)
	p := NewPainter(img, a.scale, a.fonts, a.white)
	p.Fill(at, a.theme.Palette.Background)
	drawChart(p, &v, a.theme)
	return &pendingPNG{img: img, w: w, h: h, name: fileName(a.scen.Name, "-chart.png")}
}

// finishChartPNG reads the painted chart back and queues it as a download.
// Call from Draw without a.mu: reading pixels waits for the GPU.
func (a *App) finishChartPNG(p *pendingPNG) {
	defer p.img.Deallocate()
	pix := make([]byte, 4*p.w*p.h)
	p.img.ReadPixels(pix)
	data, err := encodePNG(pix, p.w, p.h)
	a.mu.Lock()
	defer a.mu.Unlock()
	if err != nil {
		a.setNotice("The chart could not be exported: "+err.Error(), true)
		return
	}
	a.download(p.name, "image/png", data)
}

package ui

import "testing"

// BenchmarkCommitEdit times one committed edit of the demo: the engine run,
// the answer and the page layout (not the drawing), the work between Enter
// and the redraw.
func BenchmarkCommitEdit(b *testing.B) {
	a, err := New(Options{})
	if err != nil {
		b.Fatal(err)
	}
	a.resize(1280, 720, 1)
	texts := []string{"6", "5"}
	i := 0
	for b.Loop() {
		if r := a.apply(Edit{Path: "node.vision.fps", Text: texts[i%2]}); r != "" {
			b.Fatal(r)
		}
		i++
	}
}

// BenchmarkLayoutPage times laying out the page for a new window size.
func BenchmarkLayoutPage(b *testing.B) {
	a, err := New(Options{})
	if err != nil {
		b.Fatal(err)
	}
	for b.Loop() {
		a.layout()
	}
}

package ui

import (
	"bytes"
	"fmt"
	"math"
	"strings"
	"unicode/utf8"

	"github.com/hajimehoshi/ebiten/v2/text/v2"
	"golang.org/x/image/font/gofont/gomedium"
	"golang.org/x/image/font/gofont/gomono"
	"golang.org/x/image/font/gofont/goregular"
)

// FontKind picks one of the Go fonts.
type FontKind int

// The fonts: Go Regular for text, Go Medium for heads and the answer, Go Mono
// for numbers that must line up.
const (
	Regular FontKind = iota
	Medium
	Mono
	numFonts
)

// TextStyle is a font and a size in CSS pixels.
type TextStyle struct {
	Font FontKind
	Size float64
}

// LineHeight is the height of one line of the style, CSS px: 1.35 × size,
// rounded up (common practice for UI text is 1.2–1.5).
func (s TextStyle) LineHeight() float64 { return math.Ceil(s.Size * 1.35) }

// Measurer measures text in CSS pixels. *Fonts is one; layout code takes the
// interface so it reads as what it needs.
type Measurer interface {
	Advance(s string, st TextStyle) float64
}

type faceKey struct {
	font FontKind
	size float64 // device pixels
}

// Fonts holds the parsed Go fonts and a cache of faces by size. It is not safe
// for concurrent use; the app uses it under its lock.
type Fonts struct {
	src   [numFonts]*text.GoTextFaceSource
	faces map[faceKey]*text.GoTextFace
}

// LoadFonts parses the Go fonts. Call it once.
func LoadFonts() (*Fonts, error) {
	f := &Fonts{faces: map[faceKey]*text.GoTextFace{}}
	for i, ttf := range [numFonts][]byte{goregular.TTF, gomedium.TTF, gomono.TTF} {
		src, err := text.NewGoTextFaceSource(bytes.NewReader(ttf))
		if err != nil {
			return nil, fmt.Errorf("ui: parsing font %d: %w", i, err)
		}
		f.src[i] = src
	}
	return f, nil
}

// Face returns the face of st at the device scale factor.
func (f *Fonts) Face(st TextStyle, scale float64) *text.GoTextFace {
	k := faceKey{st.Font, st.Size * scale}
	face, ok := f.faces[k]
	if !ok {
		face = &text.GoTextFace{Source: f.src[st.Font], Size: k.size}
		f.faces[k] = face
	}
	return face
}

// Advance is the width of s in st, CSS px. The Go fonts are drawn unhinted,
// so advances scale linearly with the size and one scale serves every screen.
func (f *Fonts) Advance(s string, st TextStyle) float64 {
	return text.Advance(s, f.Face(st, 1))
}

// Wrap breaks s into lines no wider than width, at spaces; a word wider than
// width is broken between characters. Newlines in s start new lines.
func Wrap(m Measurer, s string, st TextStyle, width float64) []string {
	var lines []string
	for _, para := range strings.Split(s, "\n") {
		line := ""
		for _, word := range strings.Fields(para) {
			try := word
			if line != "" {
				try = line + " " + word
			}
			if m.Advance(try, st) <= width {
				line = try
				continue
			}
			if line != "" {
				lines = append(lines, line)
			}
			line = word
			for m.Advance(line, st) > width && utf8.RuneCountInString(line) > 1 {
				head := breakAt(m, line, st, width)
				lines = append(lines, head)
				line = line[len(head):]
			}
		}
		lines = append(lines, line)
	}
	return lines
}

// breakAt returns the longest prefix of s, at least one character, that fits.
func breakAt(m Measurer, s string, st TextStyle, width float64) string {
	end := 0
	for i, r := range s {
		next := i + utf8.RuneLen(r)
		if end > 0 && m.Advance(s[:next], st) > width {
			break
		}
		end = next
	}
	return s[:end]
}

// Elide shortens s with a trailing "…" until it fits width.
func Elide(m Measurer, s string, st TextStyle, width float64) string {
	if m.Advance(s, st) <= width {
		return s
	}
	r := []rune(s)
	for len(r) > 0 {
		r = r[:len(r)-1]
		t := strings.TrimRight(string(r), " ,·") + "…"
		if m.Advance(t, st) <= width {
			return t
		}
	}
	return ""
}

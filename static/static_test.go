package static

import (
	"bytes"
	"compress/gzip"
	"io"
	"net/http"
	"net/http/httptest"
	"testing"
	"testing/fstest"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"
)

func get(t *testing.T, h http.Handler, path string, gz bool) *http.Response {
	t.Helper()
	req := httptest.NewRequest("GET", path, nil)
	if gz {
		req.Header.Set("Accept-Encoding", "gzip, br")
	}
	rec := httptest.NewRecorder()
	h.ServeHTTP(rec, req)
	return rec.Result()
}

func TestHandler(t *testing.T) {
	var zipped bytes.Buffer
	zw := gzip.NewWriter(&zipped)
	zw.Write([]byte("\x00asm-body"))
	zw.Close()
	fsys := fstest.MapFS{
		"index.html":       {Data: []byte("<!doctype html><title>x</title>")},
		"nodelife.wasm":    {Data: []byte("\x00asm-body")},
		"nodelife.wasm.gz": {Data: zipped.Bytes()},
		"static.go":        {Data: []byte("package static")},
		"app.webmanifest":  {Data: []byte(`{"name": "x"}`)},
	}
	h := Handler(fsys, Extra{"/scenario.schema.json": []byte(`{"type":"object"}`)})

	res := get(t, h, "/", false)
	assert.Equal(t, 200, res.StatusCode)
	body, _ := io.ReadAll(res.Body)
	assert.Contains(t, string(body), "<title>x</title>")

	res = get(t, h, "/nodelife.wasm", true)
	require.Equal(t, 200, res.StatusCode)
	assert.Equal(t, "application/wasm", res.Header.Get("Content-Type"))
	assert.Equal(t, "gzip", res.Header.Get("Content-Encoding"))
	zr, err := gzip.NewReader(res.Body)
	require.NoError(t, err)
	plain, _ := io.ReadAll(zr)
	assert.Equal(t, "\x00asm-body", string(plain))

	res = get(t, h, "/nodelife.wasm", false)
	assert.Equal(t, "application/wasm", res.Header.Get("Content-Type"))
	assert.Empty(t, res.Header.Get("Content-Encoding"))

	res = get(t, h, "/scenario.schema.json", false)
	assert.Equal(t, "application/json", res.Header.Get("Content-Type"))

	assert.Equal(t, 404, get(t, h, "/static.go", false).StatusCode)
	assert.Equal(t, "application/manifest+json", get(t, h, "/app.webmanifest", false).Header.Get("Content-Type"))

	// An unbuilt app says how to build it.
	res = get(t, Handler(fstest.MapFS{"index.html": {Data: []byte("x")}}, nil), "/nodelife.wasm", true)
	assert.Equal(t, 404, res.StatusCode)
	body, _ = io.ReadAll(res.Body)
	assert.Contains(t, string(body), "make run")
}

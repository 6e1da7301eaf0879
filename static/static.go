// Package static holds the browser app's files (the page, service worker,
// manifest, embed example and, once built, the WebAssembly binary) embedded in
// the native binary, and the HTTP handler that serves them.
package static

import (
	"embed"
	"io/fs"
	"mime"
	"net/http"
	"path"
	"strings"
)

// Files is this folder as embedded at build time. The .wasm binary and
// wasm_exec.js are in it only when `make wasm` ran before `go build`.
//
//go:embed *
var Files embed.FS

// Extra maps a URL path ("/scenario.schema.json") to content served beside
// the files.
type Extra map[string][]byte

// Handler serves the files of fsys. A request for X is answered with X.gz and
// "Content-Encoding: gzip" when that file exists and the client accepts gzip.
// Go sources in the folder are not served.
func Handler(fsys fs.FS, extra Extra) http.Handler {
	files := http.FileServerFS(fsys)
	return http.HandlerFunc(func(w http.ResponseWriter, r *http.Request) {
		p := r.URL.Path
		if body, ok := extra[p]; ok {
			w.Header().Set("Content-Type", mime.TypeByExtension(path.Ext(p)))
			w.Write(body)
			return
		}
		name := strings.TrimPrefix(path.Clean(p), "/")
		if strings.HasSuffix(name, ".go") {
			http.NotFound(w, r)
			return
		}
		if name == "" || name == "." {
			name = "index.html"
		}
		w.Header().Set("Cache-Control", "no-cache") // the service worker keeps the offline copy
		if path.Ext(name) == ".webmanifest" {
			// Go's type table lacks the web app manifest (W3C Web App Manifest).
			w.Header().Set("Content-Type", "application/manifest+json")
		}
		if strings.Contains(r.Header.Get("Accept-Encoding"), "gzip") {
			if gz, err := fs.ReadFile(fsys, name+".gz"); err == nil {
				ct := mime.TypeByExtension(path.Ext(name))
				if ct == "" {
					ct = "application/octet-stream"
				}
				w.Header().Set("Content-Type", ct)
				w.Header().Set("Content-Encoding", "gzip")
				w.Header().Set("Vary", "Accept-Encoding")
				w.Write(gz)
				return
			}
		}
		if _, err := fs.Stat(fsys, name); err != nil && name == "nodelife.wasm" {
			http.Error(w, "the WebAssembly app is not built: run `make run` (or `make wasm` before `go build`)", http.StatusNotFound)
			return
		}
		files.ServeHTTP(w, r)
	})
}

// nodelife: starts the WebAssembly planner and defines its JavaScript API.
//
//   await nodelife.ready          resolves once the app has drawn its first frame
//   nodelife.run(scenario)        -> result object (as `nodelife plan --json`);
//                                    throws an Error with the engine's message
//   nodelife.run(scenario, {advice: false})
//                                 -> the answer without the advice (as
//                                    `nodelife plan --json --fast`): one
//                                    simulation instead of many
//   nodelife.load(scenario)       -> Promise of the result; shows the scenario,
//                                    or rejects and keeps the current one
//   nodelife.scenario()           -> the current scenario (a full scenario file)
//   nodelife.result()             -> the current result (with its advice once
//                                    worked out in the background)
//   nodelife.addEventListener("change", e => …)
//                                 after every change of the scenario or its
//                                 answer; e.detail.summary is the answer as text
//   nodelife.debug()              -> counters and rectangles, for tests;
//                                    .redraw times the last change from its
//                                    commit to its frame
//
// Performance marks (performance.getEntriesByName): "nodelife-instantiated"
// once the WebAssembly module is fetched and compiled, "nodelife-ready" at
// the first frame; both in ms from the start of the page's navigation.
//
// A scenario is a JSON string or an object. See embed-example.html.
//
// The page also keeps the scenario in localStorage (restored on the next
// visit), mirrors the answer into a live region for screen readers, opens
// scenario files dropped on it or chosen with the file picker, offers
// downloads, passes pasted text to the app and follows the system's light or
// dark preference.
(() => {
  "use strict";

  const SAVED = "nodelife.scenario";        // the scenario on screen
  const SET_ASIDE = "nodelife.scenario.bad"; // a kept scenario that did not open
  const OPTIONS = "nodelife.options";       // the options kept for comparison

  const status = document.getElementById("status");
  let bridge = null; // the Go side's functions, once the app is running
  let failed = false;
  let settle;
  const ready = new Promise((resolve, reject) => { settle = { resolve, reject }; });
  ready.catch(() => {}); // the failure is shown in the page
  const events = new EventTarget();

  function fail(message) {
    if (failed) return;
    failed = true;
    if (status) {
      status.hidden = false;
      status.className = "failed";
      status.setAttribute("role", "alert");
      status.replaceChildren();
      const head = document.createElement("strong");
      head.textContent = "nodelife could not run.";
      const body = document.createElement("pre");
      body.textContent = message;
      status.append(head, body);
    }
    console.error("nodelife: " + message);
    settle.reject(new Error(message));
  }

  function mark(name) {
    if (window.performance && performance.mark) performance.mark(name);
  }

  function text(scenario) {
    return typeof scenario === "string" ? scenario : JSON.stringify(scenario);
  }

  function call(name, ...args) {
    if (!bridge) {
      throw new Error(failed ? "nodelife is not running" : "nodelife is still loading: wait for nodelife.ready");
    }
    const reply = bridge[name](...args);
    if (reply.error !== undefined) throw new Error(reply.error);
    return JSON.parse(reply.json);
  }

  // localStorage can be missing or refuse (private windows, quotas): the
  // app works without it.
  function storage() {
    try {
      return window.localStorage;
    } catch (e) {
      return null;
    }
  }

  // loadKept is what the browser keeps under key, or "".
  function loadKept(key) {
    const s = storage();
    try {
      return (s && s.getItem(key)) || "";
    } catch (e) {
      return "";
    }
  }

  // keep keeps value under key for the next visit, or forgets the key when
  // value is empty; what is kept is named in a warning when the browser
  // refuses.
  function keep(key, value, what) {
    const s = storage();
    try {
      if (s && value) s.setItem(key, value);
      else if (s) s.removeItem(key);
    } catch (e) {
      console.warn("nodelife: " + what + " could not be kept in this browser:", e);
    }
  }

  function download(name, type, body) {
    const url = URL.createObjectURL(new Blob([body], { type }));
    const a = document.createElement("a");
    a.href = url;
    a.download = name;
    a.hidden = true;
    document.body.append(a);
    a.click();
    a.remove();
    setTimeout(() => URL.revokeObjectURL(url), 60000);
  }

  // Files: the picker and drops on the page hand the files to the app, which
  // tells scenarios (JSON) from weather files (EPW, TMY3 CSV) by their names
  // and reports a bad one in the page.
  const picker = document.createElement("input");
  picker.type = "file";
  picker.accept = ".json,.epw,.csv,application/json,text/csv";
  picker.multiple = true;
  picker.hidden = true;
  picker.id = "nodelife-file";
  picker.addEventListener("change", () => {
    openFiles(picker.files);
    picker.value = "";
  });
  document.body.append(picker);

  // openFiles opens scenarios before weather files: a scenario that names a
  // weather file waits for it and opens when it comes, so the two can come
  // together; a weather file alone goes to the scenario on screen.
  async function openFiles(list) {
    if (!bridge) return;
    const weather = (f) => /\.(epw|csv)$/i.test(f.name);
    const files = Array.from(list || []).sort((a, b) => weather(a) - weather(b));
    for (const file of files) {
      const body = await file.text();
      bridge.open(body, file.name);
    }
  }

  const dropHint = document.getElementById("drop");
  function hasFiles(e) {
    return e.dataTransfer && Array.from(e.dataTransfer.types || []).includes("Files");
  }
  window.addEventListener("dragover", (e) => {
    if (!hasFiles(e)) return;
    e.preventDefault();
    e.dataTransfer.dropEffect = "copy";
    if (dropHint) dropHint.hidden = false;
  });
  window.addEventListener("dragleave", (e) => {
    if (dropHint && (e.relatedTarget === null || e.target === dropHint)) dropHint.hidden = true;
  });
  window.addEventListener("drop", (e) => {
    if (!hasFiles(e)) return;
    e.preventDefault();
    if (dropHint) dropHint.hidden = true;
    openFiles(e.dataTransfer.files);
  });

  // Paste: ebiten cancels the canvas's key events, which stops the browser's
  // paste; let Ctrl/Cmd+V through, then hand the pasted text to the app.
  window.addEventListener("keydown", (e) => {
    if ((e.ctrlKey || e.metaKey) && !e.altKey && (e.key === "v" || e.key === "V")) e.stopPropagation();
  }, true);
  document.addEventListener("paste", (e) => {
    const t = e.clipboardData && e.clipboardData.getData("text/plain");
    if (bridge && t) {
      e.preventDefault();
      bridge.paste(t);
    }
  });

  // Light or dark, as the system says, now and when it changes.
  const dark = window.matchMedia ? window.matchMedia("(prefers-color-scheme: dark)") : null;
  function followTheme() {
    const meta = document.querySelector('meta[name="theme-color"]');
    if (meta) meta.content = dark && dark.matches ? "#14181C" : "#F6F4EF";
    if (bridge) bridge.theme(!!(dark && dark.matches));
  }
  if (dark && dark.addEventListener) dark.addEventListener("change", followTheme);

  const summary = document.getElementById("summary");

  const api = {
    ready,
    run(scenario, options) {
      let advice = true;
      if (options !== undefined && options !== null) {
        if (typeof options !== "object") throw new TypeError("nodelife.run: options must be an object, such as {advice: false}");
        if (options.advice !== undefined) {
          if (typeof options.advice !== "boolean") throw new TypeError("nodelife.run: options.advice must be true or false");
          advice = options.advice;
        }
      }
      return call("run", text(scenario), advice);
    },
    load(scenario) {
      try {
        return Promise.resolve(call("load", text(scenario)));
      } catch (e) {
        return Promise.reject(e);
      }
    },
    scenario() { return call("scenario"); },
    result() { return call("result"); },
    debug() { return call("debug"); },
    addEventListener(type, fn, opts) { events.addEventListener(type, fn, opts); },
    removeEventListener(type, fn, opts) { events.removeEventListener(type, fn, opts); },
  };
  // Hooks for the Go side (wasm/bridge_js.go).
  Object.defineProperties(api, {
    _connect: { value: (b) => { bridge = b; followTheme(); } },
    _ready: {
      value: () => {
        if (status) status.hidden = true;
        mark("nodelife-ready");
        settle.resolve();
      },
    },
    _fail: { value: fail },
    _saved: { value: () => loadKept(SAVED) },
    _savedOptions: { value: () => loadKept(OPTIONS) },
    _keepOptions: { value: (json) => keep(OPTIONS, json, "the options") },
    _setAside: {
      value: () => {
        const s = storage();
        try {
          s.setItem(SET_ASIDE, s.getItem(SAVED) || "");
          s.removeItem(SAVED);
          return "localStorage " + SET_ASIDE;
        } catch (e) {
          return "it could not be kept";
        }
      },
    },
    _changed: {
      value: (scenario, text) => {
        keep(SAVED, scenario, "the scenario");
        if (summary) summary.textContent = text;
        events.dispatchEvent(new CustomEvent("change", { detail: { summary: text } }));
      },
    },
    _download: { value: download },
    _pick: { value: () => picker.click() },
  });
  window.nodelife = api;

  // What the Go runtime writes to stderr (a panic, for one) is kept so the
  // page can show it if the app stops.
  let stderr = "";
  function keepStderr() {
    const fs = globalThis.fs;
    if (!fs || typeof fs.writeSync !== "function") return;
    const write = fs.writeSync.bind(fs);
    const decoder = new TextDecoder("utf-8");
    fs.writeSync = (fd, buf) => {
      if (fd === 2) stderr = (stderr + decoder.decode(buf)).slice(-4000);
      return write(fd, buf);
    };
  }

  async function instantiate(response, imports) {
    if (WebAssembly.instantiateStreaming) {
      try {
        return (await WebAssembly.instantiateStreaming(response.clone(), imports)).instance;
      } catch (e) {
        // Served with another MIME type: fall back to the bytes.
      }
    }
    return (await WebAssembly.instantiate(await response.arrayBuffer(), imports)).instance;
  }

  async function start() {
    if (typeof WebAssembly !== "object" || typeof Go !== "function") {
      fail("This browser cannot run WebAssembly, or wasm_exec.js did not load.");
      return;
    }
    keepStderr();
    const go = new Go();
    let instance;
    try {
      const response = await fetch("nodelife.wasm");
      if (!response.ok) {
        // A plain-text body is the server's explanation (e.g. "not built").
        const plain = (response.headers.get("Content-Type") || "").startsWith("text/plain");
        const why = plain ? (await response.text()).trim() : "";
        throw new Error(`nodelife.wasm: ${response.status} ${response.statusText}${why ? ": " + why : ""}`);
      }
      instance = await instantiate(response, go.importObject);
      mark("nodelife-instantiated");
    } catch (e) {
      fail("Loading the app failed. " + e.message);
      return;
    }
    await go.run(instance);
    fail("The app stopped." + (stderr ? "\n\n" + stderr.trim() : ""));
  }

  if ("serviceWorker" in navigator && location.protocol !== "file:") {
    window.addEventListener("load", () => {
      navigator.serviceWorker.register("sw.js").catch((e) => console.warn("nodelife: no offline copy:", e));
    });
  }
  start();
})();

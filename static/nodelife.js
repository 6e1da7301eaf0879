// nodelife: starts the WebAssembly planner and defines its JavaScript API.
//
//   await nodelife.ready          resolves once the app has drawn its first frame
//   nodelife.run(scenario)        -> result object (as `nodelife plan --json`);
//                                    throws an Error with the engine's message
//   nodelife.load(scenario)       -> Promise of the result; shows the scenario,
//                                    or rejects and keeps the current one
//   nodelife.scenario()           -> the current scenario (a full scenario file)
//   nodelife.result()             -> the current result
//   nodelife.debug()              -> counters and field rectangles, for tests
//
// A scenario is a JSON string or an object. See embed-example.html.
(() => {
  "use strict";

  const status = document.getElementById("status");
  let bridge = null; // the Go side's functions, once the app is running
  let failed = false;
  let settle;
  const ready = new Promise((resolve, reject) => { settle = { resolve, reject }; });
  ready.catch(() => {}); // the failure is shown in the page

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

  function text(scenario) {
    return typeof scenario === "string" ? scenario : JSON.stringify(scenario);
  }

  function call(name, arg) {
    if (!bridge) {
      throw new Error(failed ? "nodelife is not running" : "nodelife is still loading: wait for nodelife.ready");
    }
    const reply = bridge[name](arg);
    if (reply.error !== undefined) throw new Error(reply.error);
    return JSON.parse(reply.json);
  }

  const api = {
    ready,
    run(scenario) { return call("run", text(scenario)); },
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
  };
  // Hooks for the Go side (wasm/bridge_js.go).
  Object.defineProperties(api, {
    _connect: { value: (b) => { bridge = b; } },
    _ready: {
      value: () => {
        if (status) status.hidden = true;
        settle.resolve();
      },
    },
    _fail: { value: fail },
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

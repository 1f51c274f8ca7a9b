/* lotgate workbench, plan design page: the answer follows the form as the user types. */
"use strict";
(function () {
  var form = document.getElementById("design");
  var saveForm = document.getElementById("save");
  var status = document.getElementById("design-status");
  var tiles = document.getElementById("tiles");
  var answer = document.getElementById("answer");
  var curveHost = document.getElementById("curve");
  var pinnedList = document.getElementById("pinned");
  var current = null;
  var curve = "oc";
  var pinned = [];
  var asked = 0;

  var CURVES = {
    oc: { yLabel: "P(accept)", yFormat: "percent", yMin: 0, yMax: 1 },
    aoq: { yLabel: "AOQ", yFormat: "percent" },
    ati: { yLabel: "ATI (units)", yFormat: "number" },
    asn: { yLabel: "ASN (units)", yFormat: "number" }
  };

  /** Shows the inputs of the chosen scheme only; the others' are disabled, so that they are not sent. */
  function showScheme() {
    var scheme = form.elements.scheme.value;
    form.querySelectorAll("[data-for-scheme]").forEach(function (part) {
      part.classList.toggle("hidden", part.getAttribute("data-for-scheme").split(" ").indexOf(scheme) < 0);
    });
    form.querySelectorAll("input, select, textarea").forEach(function (field) {
      if (field.name !== "scheme") { field.disabled = field.closest("[data-for-scheme].hidden") !== null; }
    });
  }

  function drawCurve() {
    if (!current) { LG.clear(curveHost); return; }
    var look = CURVES[curve];
    var series = [];
    // A plan per defect class draws one line per class, with markers and its design points on the OC curve.
    pinned.concat([current]).forEach(function (plan) {
      var classed = plan.curves.series.length > 1;
      plan.curves.series.forEach(function (one) {
        var c = one[curve];
        if (c) {
          series.push({ name: classed && pinned.length ? plan.label + ", " + one.name : one.name, x: plan.curves.x,
            y: c.y, labels: c.labels, step: plan.curves.step, markers: classed, markEvery: classed ? 15 : 1,
            points: classed && curve === "oc" ? one.points : null });
        }
      });
    });
    if (!series.length) {
      LG.clear(curveHost).appendChild(LG.el("p", { "class": "status", text: curve === "ati"
        ? "ATI needs a lot size: give N." : "This curve does not apply to this plan." }));
      return;
    }
    LG.chart(curveHost, {
      id: curve, title: look.yLabel + " against incoming quality", xLabel: current.curves.xLabel || "incoming quality",
      xShort: "quality", yLabel: look.yLabel,
      xFormat: "percent", yFormat: look.yFormat, yMin: look.yMin, yMax: look.yMax,
      series: series, marks: current.marks || [],
      legendNote: series.some(function (s) { return s.points && s.points.length; })
        ? "large hollow marks: each class's AQL and LTPD" : null
    });
  }

  function show(reply, note) {
    if (!reply.ok) {
      LG.showErrors(form, reply.errors);
      // An error about a folded-away input unfolds it.
      form.querySelectorAll("details").forEach(function (more) {
        Array.prototype.forEach.call(more.querySelectorAll(".field-error"), function (slot) {
          if (slot.textContent) { more.open = true; }
        });
      });
      status.textContent = "";
      return;
    }
    LG.showErrors(form, []);
    current = reply;
    LG.clear(tiles);
    (reply.tiles || []).forEach(function (tile) {
      tiles.appendChild(LG.el("div", { "class": "tile", "data-key": tile.k }, [
        LG.el("div", { "class": "k", text: tile.k }), LG.el("div", { "class": "v", text: tile.v })]));
    });
    answer.textContent = (reply.text || "").replace(/^\n+/, "");
    status.textContent = note || "";
    drawCurve();
  }

  function ask() {
    var mine = ++asked;
    var started = performance.now();
    LG.get("/api/design?" + LG.formText(form)).then(function (reply) {
      if (mine !== asked) { return; }
      show(reply, reply.ok ? "answered in " + Math.round(performance.now() - started) + " ms" : "");
    }).catch(function () {
      status.textContent = "The workbench does not answer: is it still running?";
    });
  }
  var askSoon = LG.debounce(ask, 120);

  form.addEventListener("input", function (event) {
    if (event.target.name === "scheme") { showScheme(); }
    askSoon();
  });
  form.addEventListener("change", function (event) {
    if (event.target.name === "scheme") { showScheme(); }
    askSoon();
  });
  form.addEventListener("submit", function (event) { event.preventDefault(); ask(); });

  document.querySelectorAll("[data-curve]").forEach(function (tab) {
    tab.addEventListener("click", function () {
      curve = tab.getAttribute("data-curve");
      document.querySelectorAll("[data-curve]").forEach(function (other) {
        other.setAttribute("aria-selected", other === tab ? "true" : "false");
      });
      drawCurve();
    });
  });

  document.getElementById("pin").addEventListener("click", function () {
    if (!current || pinned.length >= 5) { return; }
    pinned.push(current);
    pinnedList.appendChild(LG.el("li", { text: current.label }));
    drawCurve();
  });
  document.getElementById("unpin").addEventListener("click", function () {
    pinned = [];
    LG.clear(pinnedList);
    drawCurve();
  });

  function listSaved() {
    LG.get("/api/plans").then(function (reply) {
      var list = LG.clear(document.getElementById("saved"));
      if (!reply.ok) { list.appendChild(LG.el("li", { text: reply.errors[0].message })); return; }
      if (!reply.plans.length) { list.appendChild(LG.el("li", { "class": "status", text: "No saved plans yet." })); }
      reply.plans.forEach(function (plan) {
        var open = LG.el("button", { type: "button", "class": "quiet", "data-open": plan.name, text: "open" });
        open.addEventListener("click", function () {
          LG.get("/api/plan?name=" + encodeURIComponent(plan.name)).then(function (opened) {
            if (opened.ok) {
              show(opened, "Opened " + plan.file);
            } else {
              status.textContent = opened.errors[0].message;
            }
          });
        });
        var line = plan.name + (plan.summary ? " (" + plan.summary + ")" : "");
        list.appendChild(LG.el("li", null, [LG.el("strong", { text: line }), open,
          LG.el("div", { "class": "status", text: plan.description || "" })]));
      });
    });
  }

  saveForm.addEventListener("submit", function (event) {
    event.preventDefault();
    var saveStatus = document.getElementById("save-status");
    saveStatus.textContent = "Saving...";
    LG.post("/api/plans", LG.formText(form) + "&" + LG.formText(saveForm)).then(function (reply) {
      if (!reply.ok) {
        var designErrors = (reply.errors || []).filter(function (e) { return e.field && form.querySelector('[name="' + CSS.escape(e.field) + '"]'); });
        var saveErrors = (reply.errors || []).filter(function (e) { return designErrors.indexOf(e) < 0; });
        LG.showErrors(form, designErrors);
        LG.showErrors(saveForm, saveErrors);
        saveStatus.textContent = "";
        return;
      }
      LG.showErrors(saveForm, []);
      saveStatus.textContent = "Saved " + reply.file + " (fingerprint " + reply.fingerprint + ")";
      listSaved();
    });
  });

  showScheme();
  ask();
  listSaved();
})();

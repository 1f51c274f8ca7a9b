/* lotgate workbench, sentencing page: a lot from its uploaded sheet, or unit by unit at the bench. */
"use strict";
(function () {
  var form = document.getElementById("lot");
  var bench = document.getElementById("bench");
  var planSelect = document.getElementById("f-plan");
  var fileInput = document.getElementById("f-sheet-file");
  var drop = document.getElementById("drop");
  var verdict = document.getElementById("verdict");
  var status = document.getElementById("sentence-status");
  var dropped = null;
  var units = [];

  LG.get("/api/plans?families=yes").then(function (reply) {
    LG.clear(planSelect);
    if (!reply.ok) { return; }
    reply.plans.forEach(function (plan) {
      planSelect.appendChild(LG.el("option", { value: plan.name, text: plan.name + (plan.kind === "family" ? " (plan family)" : "") }));
    });
    var wanted = new URLSearchParams(location.search).get("plan");
    if (wanted) { planSelect.value = wanted; }
  });

  fileInput.addEventListener("change", function () { dropped = null; });
  ["dragenter", "dragover"].forEach(function (name) {
    drop.addEventListener(name, function (event) { event.preventDefault(); drop.classList.add("over"); });
  });
  ["dragleave", "drop"].forEach(function (name) {
    drop.addEventListener(name, function () { drop.classList.remove("over"); });
  });
  drop.addEventListener("drop", function (event) {
    event.preventDefault();
    if (event.dataTransfer.files.length) {
      dropped = event.dataTransfer.files[0];
      status.textContent = "Sheet: " + dropped.name;
    }
  });

  /** Errors beside their fields; a folded part of the form that holds one is opened. */
  function showErrors(errors) {
    LG.showErrors(form, errors);
    form.querySelectorAll("details.more").forEach(function (part) {
      var holds = Array.prototype.some.call(part.querySelectorAll("[data-error-for]"), function (slot) {
        return slot.textContent !== "";
      });
      if (holds) { part.open = true; }
    });
  }

  function showVerdict(reply) {
    LG.clear(verdict);
    verdict.appendChild(LG.el("div", { "class": "verdict " + reply.decision, id: "decision", text: reply.headline }));
    verdict.appendChild(LG.facts(reply.facts || []));
    if (reply.notices && reply.notices.length) {
      verdict.appendChild(LG.el("h3", { text: "Notices" }));
      verdict.appendChild(LG.el("ul", { "class": "notices", id: "notices" }, reply.notices.map(function (n) { return LG.el("li", { text: n }); })));
    }
    if (reply.record) {
      verdict.appendChild(LG.el("h3", { text: "History record" }));
      verdict.appendChild(LG.facts([["sequence number", reply.record.sequence], ["chain hash", reply.record.chain]]));
    }
    if (reply.reports && reply.reports.length) {
      var links = LG.el("p", { "class": "no-print", id: "reports" });
      reply.reports.forEach(function (report) {
        links.appendChild(LG.el("a", { href: report.href, text: report.label }));
        links.appendChild(document.createTextNode("  "));
      });
      verdict.appendChild(links);
    }
    verdict.appendChild(LG.el("h3", { text: "Evidence" }));
    verdict.appendChild(LG.el("pre", { "class": "answer", id: "evidence", text: reply.text || "" }));
  }

  form.addEventListener("submit", function (event) {
    event.preventDefault();
    var file = dropped || fileInput.files[0];
    if (!file) {
      showErrors([{ field: "sheet-file", message: "choose the inspection sheet (.xlsx, .xls or .csv)" }]);
      return;
    }
    var query = LG.formText(form) + "&file=" + encodeURIComponent(file.name);
    var body = file;
    var lotFile = form.elements["lot-file"].files[0];
    if (lotFile) {
      // The lot details file goes first in the body; the workbench splits it off by its length.
      query += "&lot-file=" + encodeURIComponent(lotFile.name) + "&lot-file-bytes=" + lotFile.size;
      body = new Blob([lotFile, file]);
    }
    status.textContent = "Sentencing " + file.name + "...";
    LG.post("/api/sentence?" + query, body, "application/octet-stream").then(function (reply) {
      if (!reply.ok) {
        showErrors(reply.errors);
        status.textContent = "";
        return;
      }
      showErrors([]);
      status.textContent = "";
      showVerdict(reply);
    }).catch(function () {
      status.textContent = "The workbench does not answer: is it still running?";
    });
  });

  function drawUnits() {
    var strip = LG.clear(document.getElementById("bench-units"));
    units.forEach(function (count, i) {
      strip.appendChild(LG.el("span", { "class": count > 0 ? "nc" : "", title: "unit " + (i + 1), text: count > 0 ? String(count) : "\u2713" }));
    });
  }

  /** Asks for the plan's answer after the units so far; an answer overtaken by a later unit's is dropped. */
  var asked = 0;
  function judge() {
    drawUnits();
    var ask = ++asked;
    var said = units.length;
    var state = document.getElementById("bench-state");
    if (!said) {
      LG.clear(state).removeAttribute("data-units");
      LG.showErrors(bench, []);
      return;
    }
    var body = "plan=" + encodeURIComponent(planSelect.value) + "&units=" + units.join(",")
      + "&supplier=" + encodeURIComponent(form.elements.supplier.value)
      + "&part=" + encodeURIComponent(form.elements.part.value);
    LG.post("/api/bench", body).then(function (reply) {
      if (ask !== asked) { return; }
      LG.clear(state).setAttribute("data-units", String(said));
      if (!reply.ok) { LG.showErrors(bench, reply.errors); return; }
      LG.showErrors(bench, []);
      state.appendChild(LG.el("div", { "class": "verdict " + reply.decision, id: "bench-decision", text: reply.headline }));
      state.appendChild(LG.el("p", { id: "bench-say", text: reply.say }));
    });
  }

  function add(count) {
    units.push(count);
    judge();
  }
  document.getElementById("unit-good").addEventListener("click", function () { add(0); });
  document.getElementById("unit-bad").addEventListener("click", function () { add(1); });
  document.getElementById("unit-count").addEventListener("click", function () {
    var count = parseInt(bench.elements.defects.value, 10);
    add(isNaN(count) || count < 0 ? 0 : count);
    bench.elements.defects.value = "0";
  });
  document.getElementById("unit-undo").addEventListener("click", function () { units.pop(); judge(); });
  document.getElementById("unit-reset").addEventListener("click", function () { units = []; judge(); });
  planSelect.addEventListener("change", function () { if (units.length) { judge(); } });
})();

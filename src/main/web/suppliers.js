/* lotgate workbench, suppliers: the ranking and the store's state, or one supplier's record. */
"use strict";
(function () {
  var storeHost = document.getElementById("store");
  var rankingHost = document.getElementById("ranking");
  var supplierPanel = document.getElementById("supplier-panel");

  function problem(host, reply) {
    LG.clear(host).appendChild(LG.el("p", { "class": "form-error", text: reply.errors && reply.errors.length ? reply.errors[0].message : "no answer" }));
  }

  if (storeHost) {
    LG.get("/api/store").then(function (reply) {
      if (!reply.ok) { problem(storeHost, reply); return; }
      LG.clear(storeHost);
      storeHost.appendChild(LG.el("p", { "class": reply.intact ? "store-ok" : "store-bad", id: "store-state", text: reply.headline }));
      storeHost.appendChild(LG.facts(reply.facts || []));
    });
  }

  if (rankingHost) {
    LG.get("/api/suppliers").then(function (reply) {
      if (!reply.ok) { problem(rankingHost, reply); return; }
      document.getElementById("ranking-status").textContent = reply.note || "";
      var rows = reply.rows.map(function (row, r) {
        var cells = row.slice();
        cells[reply.nameColumn] = LG.el("a", { href: "/supplier?name=" + encodeURIComponent(reply.names[r]), text: reply.names[r] });
        return cells;
      });
      LG.clear(rankingHost).appendChild(LG.table(reply.headers, rows, reply.numeric));
    });
  }

  if (supplierPanel) {
    var name = supplierPanel.getAttribute("data-supplier");
    LG.get("/api/supplier?name=" + encodeURIComponent(name)).then(function (reply) {
      var status = document.getElementById("supplier-status");
      if (!reply.ok) { status.textContent = ""; problem(document.getElementById("supplier-facts"), reply); return; }
      document.getElementById("supplier-name").textContent = reply.name;
      LG.clear(document.getElementById("supplier-facts")).appendChild(LG.facts(reply.facts || []));
      var downloads = LG.clear(document.getElementById("downloads"));
      (reply.reports || []).forEach(function (report) {
        downloads.appendChild(LG.el("a", { href: report.href, text: report.label }));
        downloads.appendChild(document.createTextNode("  "));
      });
      var p = reply.pchart;
      if (p && p.x.length) {
        LG.chart(document.getElementById("p-chart"), {
          id: "p-chart", title: "p-chart of " + reply.name, xLabel: "lot, in order received", yLabel: "fraction nonconforming",
          xFormat: "number", yFormat: "percent", yMin: 0,
          series: [
            { name: "lot", x: p.x, y: p.p, labels: p.labels, xLabels: p.lots, markers: true, flags: p.flags },
            { name: "centre line", x: p.x, y: p.center, thin: true, xLabels: p.lots },
            { name: "upper limit", x: p.x, y: p.upper, step: true, thin: true, xLabels: p.lots },
            { name: "lower limit", x: p.x, y: p.lower, step: true, thin: true, xLabels: p.lots }
          ]
        });
      } else {
        document.getElementById("p-chart").appendChild(LG.el("p", { "class": "status", text: "No attribute lots recorded." }));
      }
      var pareto = reply.pareto;
      if (pareto && pareto.categories.length) {
        LG.bars(document.getElementById("pareto"), { id: "pareto", title: "Pareto of defects", categories: pareto.categories,
          values: pareto.values, cumulative: pareto.cumulative, yLabel: "defects found" });
      } else {
        document.getElementById("pareto").appendChild(LG.el("p", { "class": "status", text: "No defects recorded." }));
      }
      var severity = reply.severity;
      if (severity && severity.x.length) {
        LG.chart(document.getElementById("severity"), {
          id: "severity", title: "Inspection severity", xLabel: "lot, in order received", yLabel: "", left: 104,
          xFormat: "number", yMin: -0.3, yMax: severity.ticks.length - 0.7,
          yTicks: severity.ticks.map(function (label, i) { return { v: i, label: label }; }),
          series: [{ name: "", x: severity.x, y: severity.y, labels: severity.labels, xLabels: severity.lots, step: true, markers: true }]
        });
      }
      var words = document.getElementById("audit-text");
      if (words) { words.textContent = reply.text || ""; }
      var rejected = document.getElementById("rejected");
      LG.clear(rejected);
      if (reply.rejected && reply.rejected.rows.length) {
        rejected.appendChild(LG.table(reply.rejected.headers, reply.rejected.rows, reply.rejected.numeric));
      } else {
        rejected.appendChild(LG.el("p", { "class": "status", text: "No lot rejected." }));
      }
    });
  }
})();

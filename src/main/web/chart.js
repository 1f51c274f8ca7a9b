/*
 * lotgate workbench: curves and bars drawn as SVG in the page, with a read-out of the values under the
 * pointer (mouse, pen or finger). Colours, dashes and marker shapes differ together, so that series stay
 * apart in greyscale and for colour-blind readers.
 */
"use strict";
(function () {
  var NS = "http://www.w3.org/2000/svg";
  var COLOURS = ["#1f4e99", "#c0392b", "#2e8b57", "#8e44ad", "#d38400", "#34495e"];
  var DASHES = ["", "8 4", "2 3", "10 3 2 3", "5 2", "1 2"];
  var SHAPES = ["circle", "square", "triangle", "diamond", "circle", "square"];
  var W = 720, H = 380, RIGHT = 18, TOP = 16, BOTTOM = 52, LEFT = 70;

  function svg(tag, attributes, parent) {
    var node = document.createElementNS(NS, tag);
    Object.keys(attributes || {}).forEach(function (name) {
      if (name === "text") { node.textContent = attributes[name]; } else { node.setAttribute(name, attributes[name]); }
    });
    if (parent) { parent.appendChild(node); }
    return node;
  }

  function niceStep(range, count) {
    var raw = range / Math.max(1, count);
    var power = Math.pow(10, Math.floor(Math.log10(raw)));
    var unit = raw / power;
    var step = unit <= 1 ? 1 : unit <= 2 ? 2 : unit <= 2.5 ? 2.5 : unit <= 5 ? 5 : 10;
    return step * power;
  }

  function ticks(min, max, count) {
    if (!(max > min)) { max = min + 1; }
    var step = niceStep(max - min, count);
    var list = [];
    for (var v = Math.ceil(min / step - 1e-9) * step; v <= max + step * 1e-9; v += step) {
      list.push(Math.abs(v) < step * 1e-9 ? 0 : v);
    }
    return list;
  }

  /** Percent with as few digits as tell the value apart (axis ticks and read-outs). */
  function percent(v) {
    var p = v * 100;
    var a = Math.abs(p);
    var digits = a === 0 ? 0 : a >= 10 ? 1 : a >= 1 ? 2 : a >= 0.1 ? 3 : 4;
    return (+p.toFixed(digits)).toString() + "%";
  }

  function number(v) {
    var a = Math.abs(v);
    if (a >= 1000) { return Math.round(v).toLocaleString("en-US"); }
    if (a >= 100) { return (+v.toFixed(1)).toString(); }
    return (+v.toFixed(a >= 1 ? 2 : 4)).toString();
  }

  function formatter(kind) {
    return kind === "percent" ? percent : number;
  }

  function marker(shape, x, y, size, colour, parent, filled) {
    var fill = filled === false ? "#fff" : colour;
    var common = { fill: fill, stroke: colour, "stroke-width": 1.5 };
    var node;
    if (shape === "square") {
      node = svg("rect", Object.assign({ x: x - size, y: y - size, width: 2 * size, height: 2 * size }, common), parent);
    } else if (shape === "triangle") {
      node = svg("polygon", Object.assign({ points: [x, y - size * 1.2, x - size * 1.1, y + size * 0.8, x + size * 1.1, y + size * 0.8].join(" ") }, common), parent);
    } else if (shape === "diamond") {
      node = svg("polygon", Object.assign({ points: [x, y - size * 1.3, x - size * 1.2, y, x, y + size * 1.3, x + size * 1.2, y].join(" ") }, common), parent);
    } else {
      node = svg("circle", Object.assign({ cx: x, cy: y, r: size }, common), parent);
    }
    return node;
  }

  function legendSwatch(index, series) {
    var box = document.createElementNS(NS, "svg");
    box.setAttribute("viewBox", "0 0 34 10");
    svg("line", { x1: 1, y1: 5, x2: 33, y2: 5, stroke: COLOURS[index % 6], "stroke-width": 2.2, "stroke-dasharray": DASHES[index % 6] }, box);
    if (series.markers) { marker(SHAPES[index % 6], 17, 5, 3.2, COLOURS[index % 6], box); }
    return box;
  }

  /**
   * Draws a chart of lines into host. spec: {title, xLabel, yLabel, xFormat, yFormat ("percent" or
   * "number"), yMin, yMax, series: [{name, x: [], y: [], labels: [] (read-out text), markers, markEvery (a
   * marker on every so many points), step, flags: [] (true: drawn hollow-red, out of limits), points: [{x, y,
   * label}] (design points, drawn large and hollow in the series' shape)}], marks: [{x, label}],
   * yTicks: [{v, label}], legendNote (a word on the marks, after the legend)}.
   */
  LG.chart = function (host, spec) {
    LEFT = spec.left || 70;
    LG.clear(host);
    host.classList.add("chart");
    var fx = formatter(spec.xFormat), fy = formatter(spec.yFormat);
    var series = (spec.series || []).filter(function (s) { return s.x && s.x.length; });
    var xs = [], ys = [];
    series.forEach(function (s) {
      s.x.forEach(function (v) { xs.push(v); });
      s.y.forEach(function (v) { if (v !== null && isFinite(v)) { ys.push(v); } });
    });
    (spec.marks || []).forEach(function (m) { xs.push(m.x); });
    var xMin = spec.xMin !== undefined ? spec.xMin : Math.min.apply(null, xs.concat([0]));
    var xMax = spec.xMax !== undefined ? spec.xMax : Math.max.apply(null, xs.concat([xMin + 1e-9]));
    var yMin = spec.yMin !== undefined ? spec.yMin : Math.min.apply(null, ys.concat([0]));
    var yMax = spec.yMax !== undefined ? spec.yMax : Math.max.apply(null, ys.concat([yMin + 1e-9]));
    if (spec.yMax === undefined) { yMax = yMax + (yMax - yMin) * 0.06; }
    var px = function (v) { return LEFT + (v - xMin) / (xMax - xMin) * (W - LEFT - RIGHT); };
    var py = function (v) { return TOP + (1 - (v - yMin) / (yMax - yMin)) * (H - TOP - BOTTOM); };

    var root = svg("svg", { viewBox: "0 0 " + W + " " + H, role: "img", "aria-label": spec.title || spec.yLabel || "chart" });
    if (spec.id) { root.setAttribute("data-chart", spec.id); }
    svg("title", { text: spec.title || "" }, root);
    var grid = svg("g", { "class": "grid" }, root);
    var yTickList = spec.yTicks || ticks(yMin, yMax, 6).map(function (v) { return { v: v, label: fy(v) }; });
    yTickList.forEach(function (t) {
      if (t.v < yMin - 1e-12 || t.v > yMax + 1e-12) { return; }
      svg("line", { x1: LEFT, x2: W - RIGHT, y1: py(t.v), y2: py(t.v), stroke: "#e1e5ea" }, grid);
      svg("text", { x: LEFT - 6, y: py(t.v) + 4, "text-anchor": "end", "font-size": 12, fill: "#333", text: t.label }, grid);
    });
    ticks(xMin, xMax, 8).forEach(function (v) {
      svg("line", { x1: px(v), x2: px(v), y1: TOP, y2: H - BOTTOM, stroke: "#eef0f3" }, grid);
      svg("text", { x: px(v), y: H - BOTTOM + 17, "text-anchor": "middle", "font-size": 12, fill: "#333", text: fx(v) }, grid);
    });
    svg("rect", { x: LEFT, y: TOP, width: W - LEFT - RIGHT, height: H - TOP - BOTTOM, fill: "none", stroke: "#8a96a3" }, root);
    svg("text", { x: (LEFT + W - RIGHT) / 2, y: H - 10, "text-anchor": "middle", "font-size": 13, fill: "#1d2733", text: spec.xLabel || "" }, root);
    svg("text", { x: 16, y: (TOP + H - BOTTOM) / 2, "text-anchor": "middle", "font-size": 13, fill: "#1d2733",
      transform: "rotate(-90 16 " + (TOP + H - BOTTOM) / 2 + ")", text: spec.yLabel || "" }, root);

    (spec.marks || []).forEach(function (m) {
      svg("line", { x1: px(m.x), x2: px(m.x), y1: TOP, y2: H - BOTTOM, stroke: "#555", "stroke-dasharray": "3 3" }, root);
      svg("text", { x: px(m.x) + 4, y: TOP + 13, "font-size": 12, fill: "#333", text: m.label }, root);
    });

    series.forEach(function (s, i) {
      var colour = COLOURS[i % 6];
      var d = "";
      var started = false;
      for (var k = 0; k < s.x.length; k++) {
        if (s.y[k] === null || !isFinite(s.y[k])) { started = false; continue; }
        if (!started) {
          d += "M" + px(s.x[k]).toFixed(1) + " " + py(s.y[k]).toFixed(1);
          started = true;
        } else if (s.step) {
          d += "H" + px(s.x[k]).toFixed(1) + "V" + py(s.y[k]).toFixed(1);
        } else {
          d += "L" + px(s.x[k]).toFixed(1) + " " + py(s.y[k]).toFixed(1);
        }
      }
      svg("path", { d: d, fill: "none", stroke: colour, "stroke-width": s.thin ? 1.4 : 2.4, "stroke-dasharray": DASHES[i % 6],
        "data-series": s.name }, root);
      if (s.markers) {
        for (var j = 0; j < s.x.length; j++) {
          // Several marked series start their markers a little apart, so that they do not stack where lines meet.
          var every = s.markEvery || 1;
          if (s.y[j] === null || !isFinite(s.y[j]) || (j + i * Math.floor(every / 3)) % every !== 0) { continue; }
          var flagged = s.flags && s.flags[j];
          marker(flagged ? "diamond" : SHAPES[i % 6], px(s.x[j]), py(s.y[j]), flagged ? 5.5 : 3.4,
            flagged ? "#a32020" : colour, root, !flagged);
        }
      }
      (s.points || []).forEach(function (p) {
        var node = marker(SHAPES[i % 6], px(p.x), py(p.y), 6, colour, root, false);
        node.setAttribute("data-point", s.name || "");
        svg("title", { text: p.label }, node);
      });
    });

    var guide = svg("line", { y1: TOP, y2: H - BOTTOM, stroke: "#d38400", "stroke-width": 1.2, visibility: "hidden" }, root);
    var dots = series.map(function (s, i) {
      return svg("circle", { r: 5, fill: "none", stroke: COLOURS[i % 6], "stroke-width": 2.2, visibility: "hidden" }, root);
    });
    host.appendChild(root);

    var legend = LG.el("div", { "class": "legend" });
    series.forEach(function (s, i) {
      if (s.name) {
        var item = LG.el("span");
        item.appendChild(legendSwatch(i, s));
        item.appendChild(document.createTextNode(s.name));
        legend.appendChild(item);
      }
    });
    if (spec.legendNote) { legend.appendChild(LG.el("span", { "class": "note", text: spec.legendNote })); }
    host.appendChild(legend);
    var readout = LG.el("div", { "class": "readout", "aria-live": "polite" });
    host.appendChild(readout);

    function nearest(s, x) {
      var best = -1, distance = Infinity;
      for (var k = 0; k < s.x.length; k++) {
        if (s.y[k] === null || !isFinite(s.y[k])) { continue; }
        var d = Math.abs(s.x[k] - x);
        if (d < distance) { distance = d; best = k; }
      }
      return best;
    }

    function read(event) {
      var matrix = root.getScreenCTM();
      if (!matrix) { return; }
      var point = root.createSVGPoint();
      point.x = event.clientX;
      point.y = event.clientY;
      var local = point.matrixTransform(matrix.inverse());
      if (local.x < LEFT || local.x > W - RIGHT) { return; }
      var x = xMin + (local.x - LEFT) / (W - LEFT - RIGHT) * (xMax - xMin);
      var parts = [];
      var at = null;
      series.forEach(function (s, i) {
        var k = nearest(s, x);
        if (k < 0) { dots[i].setAttribute("visibility", "hidden"); return; }
        at = at === null ? k : at;
        dots[i].setAttribute("cx", px(s.x[k]));
        dots[i].setAttribute("cy", py(s.y[k]));
        dots[i].setAttribute("visibility", "visible");
        var value = s.labels && s.labels[k] !== undefined ? s.labels[k] : fy(s.y[k]);
        parts.push(value + (series.length > 1 && s.name ? " (" + s.name + ")" : ""));
      });
      if (at === null) { return; }
      var s0 = series[0];
      var k0 = nearest(s0, x);
      guide.setAttribute("x1", px(s0.x[k0]));
      guide.setAttribute("x2", px(s0.x[k0]));
      guide.setAttribute("visibility", "visible");
      var head = s0.xLabels ? s0.xLabels[k0] : (spec.xShort || spec.xLabel || "x") + " " + fx(s0.x[k0]);
      readout.textContent = head + ": " + (spec.yLabel ? spec.yLabel + " " : "") + parts.join("; ");
    }
    root.addEventListener("pointermove", read);
    root.addEventListener("pointerdown", read);
    return root;
  };

  /** Bars with an optional cumulative-percent line (Pareto). spec: {categories, values, cumulative, yLabel}. */
  LG.bars = function (host, spec) {
    LEFT = 70;
    LG.clear(host);
    host.classList.add("chart");
    var n = spec.categories.length;
    var max = Math.max.apply(null, spec.values.concat([1]));
    var yTop = max * 1.08;
    var root = svg("svg", { viewBox: "0 0 " + W + " " + H, role: "img", "aria-label": spec.title || "bars" });
    if (spec.id) { root.setAttribute("data-chart", spec.id); }
    var plotW = W - LEFT - RIGHT - (spec.cumulative ? 40 : 0);
    var py = function (v) { return TOP + (1 - v / yTop) * (H - TOP - BOTTOM); };
    ticks(0, yTop, 5).forEach(function (v) {
      svg("line", { x1: LEFT, x2: LEFT + plotW, y1: py(v), y2: py(v), stroke: "#e1e5ea" }, root);
      svg("text", { x: LEFT - 6, y: py(v) + 4, "text-anchor": "end", "font-size": 12, fill: "#333", text: number(v) }, root);
    });
    var band = plotW / Math.max(1, n);
    var readout = LG.el("div", { "class": "readout", "aria-live": "polite" });
    spec.categories.forEach(function (name, i) {
      var x = LEFT + i * band + band * 0.15;
      var bar = svg("rect", { x: x, y: py(spec.values[i]), width: band * 0.7, height: py(0) - py(spec.values[i]),
        fill: i === 0 ? "#1f4e99" : "#6d8fc6", stroke: "#1f4e99" }, root);
      var label = name.length > 16 ? name.slice(0, 15) + "\u2026" : name;
      svg("text", { x: x + band * 0.35, y: H - BOTTOM + 16, "text-anchor": "middle", "font-size": n > 8 ? 10 : 12, fill: "#333", text: label }, root);
      var say = function () {
        readout.textContent = name + ": " + number(spec.values[i]) + (spec.cumulative ? "; cumulative " + percent(spec.cumulative[i]) : "");
      };
      bar.addEventListener("pointermove", say);
      bar.addEventListener("pointerdown", say);
    });
    if (spec.cumulative) {
      var d = "";
      spec.cumulative.forEach(function (c, i) {
        var x = LEFT + i * band + band * 0.5;
        var y = TOP + (1 - c) * (H - TOP - BOTTOM);
        d += (i ? "L" : "M") + x.toFixed(1) + " " + y.toFixed(1);
        marker("square", x, y, 3, "#c0392b", root);
      });
      svg("path", { d: d, fill: "none", stroke: "#c0392b", "stroke-width": 2, "stroke-dasharray": "8 4" }, root);
      [0, 0.25, 0.5, 0.75, 1].forEach(function (c) {
        svg("text", { x: LEFT + plotW + 6, y: TOP + (1 - c) * (H - TOP - BOTTOM) + 4, "font-size": 12, fill: "#c0392b", text: percent(c) }, root);
      });
    }
    svg("rect", { x: LEFT, y: TOP, width: plotW, height: H - TOP - BOTTOM, fill: "none", stroke: "#8a96a3" }, root);
    svg("text", { x: 16, y: (TOP + H - BOTTOM) / 2, "text-anchor": "middle", "font-size": 13, fill: "#1d2733",
      transform: "rotate(-90 16 " + (TOP + H - BOTTOM) / 2 + ")", text: spec.yLabel || "" }, root);
    host.appendChild(root);
    host.appendChild(readout);
    return root;
  };

  LG.percent = percent;
})();

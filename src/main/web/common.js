/* lotgate workbench: helpers every page uses. Text from the server is only ever set as text, never as HTML. */
"use strict";
var LG = window.LG || {};
window.LG = LG;

LG.csrf = function () {
  var meta = document.querySelector('meta[name="lotgate-csrf"]');
  return meta ? meta.getAttribute("content") : "";
};

/** An element with attributes and children (strings become text nodes). */
LG.el = function (tag, attributes, children) {
  var node = document.createElement(tag);
  if (attributes) {
    Object.keys(attributes).forEach(function (name) {
      if (name === "text") { node.textContent = attributes[name]; } else { node.setAttribute(name, attributes[name]); }
    });
  }
  (children || []).forEach(function (child) {
    node.appendChild(typeof child === "string" ? document.createTextNode(child) : child);
  });
  return node;
};

LG.clear = function (node) {
  while (node.firstChild) { node.removeChild(node.firstChild); }
  return node;
};

/** The fields of a form as URL-encoded text. */
LG.formText = function (form) {
  var params = new URLSearchParams();
  Array.prototype.forEach.call(form.elements, function (field) {
    if (!field.name || field.disabled || field.type === "file") { return; }
    if ((field.type === "checkbox" || field.type === "radio") && !field.checked) { return; }
    params.append(field.name, field.value);
  });
  return params.toString();
};

/** Answers of the workbench's own JSON: the parsed object, or a refusal as {ok:false, errors:[...]}. */
LG.reply = function (response) {
  var type = response.headers.get("Content-Type") || "";
  if (type.indexOf("application/json") === 0) { return response.json(); }
  return response.text().then(function (text) {
    return { ok: false, status: response.status, errors: [{ field: null, message: text }] };
  });
};

LG.get = function (url) {
  return fetch(url, { credentials: "same-origin" }).then(LG.reply);
};

/** A change: POST with the page's CSRF token; body is form text or a File. */
LG.post = function (url, body, contentType) {
  var headers = { "X-Lotgate-Csrf": LG.csrf() };
  headers["Content-Type"] = contentType || "application/x-www-form-urlencoded";
  return fetch(url, { method: "POST", credentials: "same-origin", headers: headers, body: body }).then(LG.reply);
};

/**
 * Puts each error next to the field it is about (the element with data-error-for="name"), and the
 * rest in the form's own error line; clears old ones first.
 */
LG.showErrors = function (form, errors) {
  form.querySelectorAll("[data-error-for]").forEach(function (node) { node.textContent = ""; });
  form.querySelectorAll(".bad").forEach(function (node) { node.classList.remove("bad"); });
  var general = form.querySelector(".form-error");
  if (general) { general.textContent = ""; }
  // Where two parts of a form carry a field of one name, the one shown gets the error.
  function shown(selector) {
    var nodes = Array.prototype.filter.call(form.querySelectorAll(selector), function (node) {
      return !node.closest(".hidden");
    });
    return nodes.length ? nodes[0] : null;
  }
  (errors || []).forEach(function (error) {
    var slot = error.field ? shown('[data-error-for="' + CSS.escape(error.field) + '"]') : null;
    if (slot) {
      slot.textContent = error.message;
      var input = shown('[name="' + CSS.escape(error.field) + '"]');
      if (input) { input.classList.add("bad"); }
    } else if (general) {
      general.textContent = (general.textContent ? general.textContent + " " : "") + error.message;
    }
  });
};

/** Calls fn at most once per pause in typing (ms). */
LG.debounce = function (fn, ms) {
  var timer = null;
  return function () {
    var args = arguments;
    clearTimeout(timer);
    timer = setTimeout(function () { fn.apply(null, args); }, ms);
  };
};

/** A definition list from [label, value] pairs. */
LG.facts = function (pairs) {
  var list = LG.el("dl", { "class": "facts" });
  pairs.forEach(function (pair) {
    if (pair[1] === null || pair[1] === undefined || pair[1] === "") { return; }
    list.appendChild(LG.el("dt", { text: pair[0] }));
    list.appendChild(LG.el("dd", { text: String(pair[1]) }));
  });
  return list;
};

/** A table from a header row and rows of text; cells flagged numeric are right-aligned. */
LG.table = function (headers, rows, numeric, flagRow) {
  var table = LG.el("table", { "class": "list" });
  var head = LG.el("tr");
  headers.forEach(function (h, i) { head.appendChild(LG.el("th", { text: h, "class": numeric && numeric[i] ? "n" : "" })); });
  table.appendChild(LG.el("thead", null, [head]));
  var body = LG.el("tbody");
  rows.forEach(function (row, r) {
    var tr = LG.el("tr", flagRow && flagRow(r) ? { "class": "flag" } : null);
    row.forEach(function (cell, i) {
      if (cell instanceof Node) {
        var td = LG.el("td");
        td.appendChild(cell);
        tr.appendChild(td);
      } else {
        tr.appendChild(LG.el("td", { text: cell === null || cell === undefined ? "" : String(cell), "class": numeric && numeric[i] ? "n" : "" }));
      }
    });
    body.appendChild(tr);
  });
  table.appendChild(body);
  return table;
};

// Telltale report behaviour. Reads only what the page already shows; writes text, never markup.
(function () {
  'use strict';
  var tip = document.getElementById('tt-tip');

  function describe(mark) {
    var id = mark.getAttribute('aria-describedby');
    var desc = id ? document.getElementById(id) : null;
    return desc ? desc.textContent : '';
  }

  function rowsOf(mark) {
    var doc = mark.closest('.tt-doc');
    return doc ? doc.querySelectorAll('.tt-ledger tbody tr') : [];
  }

  function light(mark, on) {
    var rows = rowsOf(mark);
    var row = rows[Number(mark.getAttribute('data-row'))];
    if (row) { row.classList.toggle('tt-hot', on); }
  }

  function show(mark) {
    if (!tip) { return; }
    tip.textContent = describe(mark);
    tip.hidden = false;
    var box = mark.getBoundingClientRect();
    var left = Math.max(8, Math.min(box.left + window.scrollX, window.scrollX + document.documentElement.clientWidth - tip.offsetWidth - 8));
    tip.style.left = left + 'px';
    tip.style.top = (box.bottom + window.scrollY + 6) + 'px';
    light(mark, true);
  }

  function hide(mark) {
    if (tip) { tip.hidden = true; }
    if (mark) { light(mark, false); }
  }

  function markOf(event) {
    return event.target && event.target.closest ? event.target.closest('mark.tt-m') : null;
  }

  document.addEventListener('mouseover', function (e) { var m = markOf(e); if (m) { show(m); } });
  document.addEventListener('mouseout', function (e) { var m = markOf(e); if (m) { hide(m); } });
  document.addEventListener('focusin', function (e) { var m = markOf(e); if (m) { show(m); } });
  document.addEventListener('focusout', function (e) { var m = markOf(e); if (m) { hide(m); } });
  document.addEventListener('keydown', function (e) { if (e.key === 'Escape') { hide(markOf(e)); } });

  // Hovering a ledger row outlines its marks in the text.
  document.addEventListener('mouseover', function (e) {
    var row = e.target.closest ? e.target.closest('.tt-ledger tbody tr') : null;
    if (!row) { return; }
    var doc = row.closest('.tt-doc');
    var index = Array.prototype.indexOf.call(row.parentNode.children, row);
    doc.querySelectorAll('mark.tt-m').forEach(function (m) {
      m.classList.toggle('tt-lit', Number(m.getAttribute('data-row')) === index);
    });
  });
  document.addEventListener('mouseout', function (e) {
    var row = e.target.closest ? e.target.closest('.tt-ledger tbody tr') : null;
    if (!row) { return; }
    row.closest('.tt-doc').querySelectorAll('mark.tt-lit').forEach(function (m) { m.classList.remove('tt-lit'); });
  });

  // ---- findings table: sort by a column, filter by text, kind, severity, confirmation
  var findings = document.getElementById('tt-findings');
  if (findings) {
    var body = findings.tBodies[0];
    var heads = findings.tHead.rows[0].cells;
    Array.prototype.forEach.call(findings.querySelectorAll('th button'), function (button) {
      button.addEventListener('click', function () {
        var col = Number(button.getAttribute('data-col'));
        var numeric = button.getAttribute('data-type') === 'num';
        var th = button.parentNode;
        var descending = th.getAttribute('aria-sort') === 'ascending';
        Array.prototype.forEach.call(heads, function (h) { h.setAttribute('aria-sort', 'none'); });
        th.setAttribute('aria-sort', descending ? 'descending' : 'ascending');
        var rows = Array.prototype.slice.call(body.rows);
        rows.sort(function (a, b) {
          var x = a.cells[col].getAttribute('data-v');
          var y = b.cells[col].getAttribute('data-v');
          var order = numeric ? Number(x) - Number(y) : x.localeCompare(y, 'en');
          return descending ? -order : order;
        });
        rows.forEach(function (r) { body.appendChild(r); });
      });
    });
    var text = document.getElementById('tt-f-text');
    var kind = document.getElementById('tt-f-kind');
    var sev = document.getElementById('tt-f-sev');
    var conf = document.getElementById('tt-f-conf');
    var supp = document.getElementById('tt-f-supp');
    var count = document.getElementById('tt-f-count');
    var filter = function () {
      var needle = text.value.trim().toLowerCase();
      var shown = 0;
      Array.prototype.forEach.call(body.rows, function (r) {
        var words = (r.cells[0].getAttribute('data-v') + ' ' + r.cells[3].getAttribute('data-v')).toLowerCase();
        var ok = (!needle || words.indexOf(needle) >= 0)
          && (!kind.value || r.getAttribute('data-kind') === kind.value)
          && (!sev.value || r.getAttribute('data-sev') === sev.value)
          && (!conf.checked || r.getAttribute('data-conf') === '1')
          && (supp.checked || r.getAttribute('data-supp') === '0');
        r.hidden = !ok;
        if (ok) { shown++; }
      });
      count.textContent = shown + ' of ' + body.rows.length + ' artefacts shown';
    };
    [text, kind, sev, conf, supp].forEach(function (el) {
      el.addEventListener('input', filter);
      el.addEventListener('change', filter);
    });
    filter();
  }

  // ---- document browser: a paged index; views are cloned from <template> on demand
  var index = document.getElementById('tt-index');
  var viewer = document.getElementById('tt-viewer');
  if (index && viewer) {
    var rows = index.tBodies[0].rows;
    var size = Number(index.getAttribute('data-page-size')) || 50;
    var page = 0;
    var pages = Math.max(1, Math.ceil(rows.length / size));
    var prev = document.getElementById('tt-d-prev');
    var next = document.getElementById('tt-d-next');
    var label = document.getElementById('tt-d-page');
    var search = document.getElementById('tt-d-filter');
    var paint = function () {
      var needle = search.value.trim().toLowerCase();
      var shown = 0;
      for (var i = 0; i < rows.length; i++) {
        var visible = needle
          ? rows[i].cells[0].textContent.toLowerCase().indexOf(needle) >= 0 && shown < size
          : Math.floor(i / size) === page;
        rows[i].hidden = !visible;
        if (visible) { shown++; }
      }
      prev.disabled = !!needle || page === 0;
      next.disabled = !!needle || page >= pages - 1;
      label.textContent = needle ? shown + ' matching (first ' + size + ')' : 'page ' + (page + 1) + ' of ' + pages;
    };
    prev.addEventListener('click', function () { if (page > 0) { page--; paint(); } });
    next.addEventListener('click', function () { if (page < pages - 1) { page++; paint(); } });
    search.addEventListener('input', paint);
    paint();

    var open = function (anchor) {
      var template = document.getElementById('tpl-' + anchor);
      if (!template) { return false; }
      if (!document.getElementById(anchor)) {
        viewer.replaceChildren(template.content.cloneNode(true));
        Array.prototype.forEach.call(rows, function (r) {
          r.classList.toggle('tt-open', 'doc-' + r.getAttribute('data-i') === anchor);
        });
      }
      var shown = document.getElementById(anchor);
      shown.scrollIntoView();
      var heading = document.getElementById(anchor + '-h');
      if (heading) { heading.setAttribute('tabindex', '-1'); heading.focus({preventScroll: true}); }
      return true;
    };
    var fromHash = function () {
      var anchor = decodeURIComponent(location.hash.slice(1));
      if (/^doc-[0-9]+$/.test(anchor) && !open(anchor) && document.readyState === 'loading') {
        // The script runs before the document templates are parsed; try again once they are.
        document.addEventListener('DOMContentLoaded', fromHash, {once: true});
      }
    };
    window.addEventListener('hashchange', fromHash);
    fromHash();
  }

  // Lets a benchmark read when the page became interactive (User Timing API).
  if (window.performance && performance.mark) { performance.mark('telltale-ready'); }
}());

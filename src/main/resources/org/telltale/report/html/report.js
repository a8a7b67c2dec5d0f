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
}());

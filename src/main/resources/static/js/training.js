// Training log: charts from the page's JSON data block, and the "what was actually done" fieldset that only
// matters when a session was not done as planned. Every page works without this script (tables below charts).
(function () {
  'use strict';

  function toggleDifferent() {
    var box = document.getElementById('asPlanned1') || document.querySelector('input[name="asPlanned"][type="checkbox"]');
    var fieldset = document.getElementById('different');
    if (!box || !fieldset) {
      return;
    }
    var apply = function () {
      fieldset.classList.toggle('hidden', box.checked && !fieldset.querySelector('.has-error, .error'));
    };
    box.addEventListener('change', apply);
    apply();
  }

  function series(label, data, colour, extra) {
    var s = { label: label, data: data, borderColor: colour, backgroundColor: colour, spanGaps: true, pointRadius: 2 };
    Object.keys(extra || {}).forEach(function (k) { s[k] = extra[k]; });
    return s;
  }

  function constant(value, length) {
    var out = [];
    for (var i = 0; i < length; i++) {
      out.push(value);
    }
    return out;
  }

  function chart(id, datasets, days, yTitle, yMin, yMax) {
    var canvas = document.getElementById(id);
    if (!canvas) {
      return;
    }
    var y = { title: { display: true, text: yTitle }, beginAtZero: true };
    if (yMin !== undefined) { y.min = yMin; }
    if (yMax !== undefined) { y.max = yMax; }
    // eslint-disable-next-line no-new
    new window.Chart(canvas, {
      type: 'line',
      data: { labels: days, datasets: datasets },
      options: { responsive: true, maintainAspectRatio: false, animation: false, interaction: { mode: 'index', intersect: false },
        scales: { y: y } }
    });
  }

  function charts() {
    var block = document.getElementById('training-chart-data');
    if (!block || typeof window.Chart !== 'function') {
      return;
    }
    var d = JSON.parse(block.textContent);
    var L = d.labels;
    var n = d.days.length;
    var ink = '#2f5d7c', warm = '#b35c00', green = '#25633a', grey = '#8a97a1', red = '#9b1c1c', purple = '#6b3fa0';
    chart('chart-daily', [
      series(L.dailyLoad, d.daily, grey, { type: 'bar', order: 2 }),
      series(L.acute, d.acute, warm, { pointRadius: 0, order: 1 }),
      series(L.chronic, d.chronic, ink, { pointRadius: 0, order: 1 })
    ], d.days, L.loadAxis);
    chart('chart-ratio', [
      series(L.ratioEwma, d.ratioEwma, warm, { spanGaps: false }),
      series(L.ratioCoupled, d.ratioCoupled, ink, { spanGaps: false, borderDash: [4, 3] }),
      series(L.ratioUncoupled, d.ratioUncoupled, purple, { spanGaps: false, borderDash: [1, 3] }),
      series(L.caution, constant(d.caution, n), red, { pointRadius: 0, borderWidth: 1 })
    ], d.days, L.ratioAxis);
    chart('chart-pain', [
      series(L.painDuring, d.painDuring, warm, { showLine: false, pointRadius: 4 }),
      series(L.painMorning, d.painMorning, purple, { showLine: false, pointRadius: 4, pointStyle: 'rect' }),
      series(L.painLimit, constant(d.painLimit, n), red, { pointRadius: 0, borderWidth: 1 })
    ], d.days, L.painAxis, 0, 10);
    chart('chart-demand', [
      series(L.plannedD, d.plannedD, ink, { stepped: true, pointRadius: 0, spanGaps: false }),
      series(L.loggedD, d.loggedD, green, { showLine: false, pointRadius: 4 })
    ], d.days, L.demandAxis);
  }

  document.addEventListener('DOMContentLoaded', function () {
    toggleDifferent();
    charts();
  });
}());

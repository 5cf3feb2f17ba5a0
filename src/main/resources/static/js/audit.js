// Audit pages: the activity chart. Its numbers come from a JSON script block; the same numbers are in a table.
document.addEventListener('DOMContentLoaded', () => {
  const source = document.getElementById('audit-activity-data');
  const canvas = document.getElementById('audit-activity-chart');
  if (!source || !canvas || typeof Chart === 'undefined') {
    return;
  }
  const data = JSON.parse(source.textContent);
  const style = getComputedStyle(document.documentElement);
  const colour = (name, fallback) => (style.getPropertyValue(name) || fallback).trim();
  // The chart instance is kept on the canvas so tests and later scripts can read what was drawn.
  canvas.auditChart = new Chart(canvas, {
    type: 'bar',
    data: {
      labels: data.months,
      datasets: [
        { label: canvas.dataset.labelEvents, data: data.events, backgroundColor: colour('--accent', '#2f6f8f') },
        { label: canvas.dataset.labelPatients, data: data.aboutPatients, backgroundColor: colour('--muted', '#6b7a86') },
        { label: canvas.dataset.labelDenied, data: data.denied, backgroundColor: colour('--stop', '#b3261e') }
      ]
    },
    options: {
      responsive: true,
      maintainAspectRatio: false,
      animation: false,
      scales: { y: { beginAtZero: true, ticks: { precision: 0 } } }
    }
  });
});

// Club form: keep the unit beside each number in step with the unit chosen, and show the pendulum steps only
// when the pendulum method is chosen. The form works the same without this script.
document.addEventListener('DOMContentLoaded', () => {
  const form = document.querySelector('form.club-form');
  if (!form) {
    return;
  }
  const unitOf = (id) => form.querySelector('#' + id)?.closest('.with-unit')?.querySelector('.unit');
  const follow = (selectId, fieldIds) => {
    const select = form.querySelector('#' + selectId);
    if (!select) {
      return;
    }
    const update = () => {
      const label = select.options[select.selectedIndex]?.text || '';
      fieldIds.map(unitOf).filter(Boolean).forEach((span) => { span.textContent = label; });
    };
    select.addEventListener('change', update);
  };
  follow('massUnit', ['mass']);
  follow('lengthUnit', ['length', 'balancePoint', 'handleLength', 'pendulumPivot', 'headCentre']);

  const pendulum = form.querySelector('fieldset.pendulum');
  const methods = form.querySelectorAll('input[name=inertiaMethod]');
  const showMethod = () => {
    const chosen = form.querySelector('input[name=inertiaMethod]:checked');
    pendulum.classList.toggle('hidden', chosen !== null && chosen.value !== 'PENDULUM');
  };
  methods.forEach((radio) => radio.addEventListener('change', showMethod));
  showMethod();
});

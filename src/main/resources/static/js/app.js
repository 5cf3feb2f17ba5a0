// Small progressive enhancements; every page works without JavaScript.
document.addEventListener('DOMContentLoaded', () => {
  // Buttons that need a confirmation carry data-confirm with the question.
  document.querySelectorAll('[data-confirm]').forEach((el) => {
    el.addEventListener('click', (event) => {
      if (!window.confirm(el.getAttribute('data-confirm'))) {
        event.preventDefault();
      }
    });
  });
});

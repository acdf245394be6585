document.documentElement.dataset.js = 'on';

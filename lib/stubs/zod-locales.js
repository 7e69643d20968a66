// Stands in for zod's locale index in the app bundle (see metro.config.js); English stays built in.
module.exports = {};

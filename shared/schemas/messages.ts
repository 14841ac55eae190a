import { z } from 'zod';

// Plain words for the messages no schema sets itself; a message given in a schema wins.
z.config({
  customError: (issue) => {
    if (issue.code === 'invalid_type' && issue.input === undefined) return 'Required';
    return undefined;
  },
});

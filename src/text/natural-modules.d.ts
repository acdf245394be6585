/**
 * Types for the parts of `natural` that the text stage loads by path.
 *
 * `import 'natural'` loads every module of the package, among them storage adapters that call
 * `dotenv.config()` (reads `.env` from the working folder, writes to `process.env` and prints to
 * the console) and takes about a second; the stage needs only the tokenizer, the stop word list
 * and the Porter stemmer, so it imports those three files directly.
 */
declare module 'natural/lib/natural/stemmers/porter_stemmer.js' {
  const PorterStemmer: {
    /** Lower-cases and stems one token (Porter 1980). Tokens shorter than 3 characters come back as they are. */
    stem(token: string): string;
  };
  export default PorterStemmer;
}

declare module 'natural/lib/natural/util/stopwords.js' {
  const stopwords: { readonly words: readonly string[] };
  export default stopwords;
}

declare module 'natural/lib/natural/tokenizers/regexp_tokenizer.js' {
  const tokenizers: {
    WordTokenizer: new () => { tokenize(text: string): string[] };
  };
  export default tokenizers;
}

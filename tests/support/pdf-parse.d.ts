declare module 'pdf-parse/lib/pdf-parse.js' {
  import parse from 'pdf-parse';
  export default parse;
}

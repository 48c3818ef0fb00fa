// The start of the buyer's bundle (scripts/build-buyer.ts builds it; the server sends it for /d/...).
import { AppRegistry } from 'react-native';

import { BuyerApp } from './buyer-app';

AppRegistry.registerComponent('buyer', () => BuyerApp);
AppRegistry.runApplication('buyer', { rootTag: document.getElementById('root'), initialProps: { pathname: window.location.pathname, search: window.location.search } });
